// The public entry point for checking a tree: every problem, not just the first.
import { analyseTree } from './analyse-tree.js';
import type { TreeProblem } from './problem.js';

/** Checks a definition (any value, e.g. an imported JSON file) and returns every problem found; [] means clean. */
export function validateTree(definition: unknown): TreeProblem[] {
  return [...analyseTree(definition).problems];
}
