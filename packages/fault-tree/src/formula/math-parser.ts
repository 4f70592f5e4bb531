// The only mathjs instance that reads formulas. It is built with `create` and the parse factory
// alone: it can turn text into a syntax tree but holds none of mathjs's evaluation functions, so
// nothing a lead writes is ever executed by mathjs. Heatpath evaluates the checked tree itself.
import { create, parseDependencies } from 'mathjs';
import type { FactoryFunctionMap, MathNode } from 'mathjs';

function present(factories: FactoryFunctionMap | undefined): FactoryFunctionMap {
  if (factories === undefined) {
    throw new Error('The mathjs parse factory is missing from this build.');
  }
  return factories;
}

const math = create({ parseDependencies: present(parseDependencies) }, {});

export type ParseOutcome =
  { readonly ok: true; readonly node: MathNode } | { readonly ok: false; readonly message: string };

export function parseFormulaSource(source: string): ParseOutcome {
  try {
    return { ok: true, node: math.parse(source) };
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { ok: false, message: detail };
  }
}
