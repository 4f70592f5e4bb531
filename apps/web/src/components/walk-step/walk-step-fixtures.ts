// Steps of a shipped tree for the walk-step component tests, compiled by the fault-tree package.
import {
  compileTree,
  type CompiledTree,
  type MeasurementNode,
  type ProcedureNode,
  type QuestionNode,
} from '@heatpath/fault-tree';
import { overheatsIntermittentTree } from '@heatpath/fault-tree/trees';

let compiled: CompiledTree | undefined;

export function shippedTree(): CompiledTree {
  if (compiled) return compiled;
  const result = compileTree(overheatsIntermittentTree);
  if (!result.ok) throw new Error('The shipped tree does not compile.');
  compiled = result.tree;
  return compiled;
}

function step(id: string) {
  const node = shippedTree().nodes.get(id);
  if (!node) throw new Error(`No step ${id}.`);
  return { ...node, id };
}

export function measurementStep(id: string): MeasurementNode & { id: string } {
  const node = step(id);
  if (node.kind !== 'measurement') throw new Error(`${id} is not a measurement.`);
  return node;
}

export function questionStep(id: string): QuestionNode & { id: string } {
  const node = step(id);
  if (node.kind !== 'question') throw new Error(`${id} is not a question.`);
  return node;
}

export function procedureStep(id: string): ProcedureNode & { id: string } {
  const node = step(id);
  if (node.kind !== 'procedure') throw new Error(`${id} is not a procedure.`);
  return node;
}
