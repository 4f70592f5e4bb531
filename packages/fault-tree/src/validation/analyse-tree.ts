// Runs every check on a definition and, when it is clean, keeps what the checks learned (parsed
// definition, graph, checked formulas) so compiling does not do the work twice.
import type { FormulaModel } from '../model/formula-model.js';
import type { TreeDefinition } from '../schema/tree-schema.js';
import { checkAvailability } from './check-availability.js';
import { checkCoverage } from './check-coverage.js';
import { checkFormulas } from './check-formulas.js';
import type { GraphFacts } from './check-graph.js';
import { checkGraph } from './check-graph.js';
import { checkNames } from './check-names.js';
import { checkSafety } from './check-safety.js';
import { parseDefinition } from './parse-definition.js';
import type { TreeProblem } from './problem.js';

export interface TreeAnalysis {
  readonly problems: readonly TreeProblem[];
  /** Present only when there are no problems. */
  readonly clean?: {
    readonly definition: TreeDefinition;
    readonly graph: GraphFacts;
    readonly formulas: FormulaModel;
  };
}

export function analyseTree(raw: unknown): TreeAnalysis {
  const parsed = parseDefinition(raw);
  const { envelope } = parsed;
  if (envelope === undefined) {
    return { problems: parsed.problems };
  }
  const problems: TreeProblem[] = [...parsed.problems];
  const graph = checkGraph(envelope.start, parsed.nodes, parsed.brokenIds);
  problems.push(...graph.problems);
  const names = checkNames(parsed.nodes, envelope.computed);
  problems.push(...names.problems);
  const formulas = checkFormulas(parsed.nodes, envelope.computed, names.inputs);
  problems.push(...formulas.problems);
  const settled = !graph.facts.hasLoops && parsed.brokenIds.size === 0;
  if (settled) {
    problems.push(
      ...checkAvailability(
        envelope.start,
        parsed.nodes,
        graph.facts.adjacency,
        graph.facts.reachable,
        formulas.model,
      ),
    );
  }
  problems.push(...checkCoverage(parsed.nodes, graph.facts.reachable, formulas.model));
  problems.push(...checkSafety(parsed.nodes));

  if (problems.length > 0 || parsed.definition === undefined) {
    return { problems };
  }
  return {
    problems,
    clean: { definition: parsed.definition, graph: graph.facts, formulas: formulas.model },
  };
}
