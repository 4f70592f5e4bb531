// A problem validation found in a tree: a stable code the editor and API can key on, the node it
// belongs to, a sentence a workshop lead understands, and where in the definition it sits.

export const problemCodes = [
  'schema',
  'unknown-start',
  'unknown-target',
  'missing-target',
  'unreachable',
  'dead-end',
  'cycle',
  'no-outcome',
  'duplicate-name',
  'reserved-name',
  'duplicate-choice',
  'unit-not-canonical',
  'invalid-range',
  'formula-syntax',
  'formula-not-allowed',
  'unknown-name',
  'mismatched-units',
  'formula-not-condition',
  'computed-cycle',
  'value-not-available',
  'range-not-covered',
  'hazard-without-caution',
] as const;
export type ProblemCode = (typeof problemCodes)[number];

/** A JSON path into the definition, e.g. ["nodes", "cap-test", "branches", 0, "when"]. */
export type DefinitionPath = readonly (string | number)[];

export interface TreeProblem {
  readonly code: ProblemCode;
  readonly message: string;
  readonly nodeId?: string;
  readonly path?: DefinitionPath;
}

export function problem(
  code: ProblemCode,
  message: string,
  where: { readonly nodeId?: string; readonly path?: DefinitionPath } = {},
): TreeProblem {
  return {
    code,
    message,
    ...(where.nodeId === undefined ? {} : { nodeId: where.nodeId }),
    ...(where.path === undefined ? {} : { path: where.path }),
  };
}
