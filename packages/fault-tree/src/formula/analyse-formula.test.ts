import { describe, expect, it } from 'vitest';
import type { Quantity } from '../units/quantities.js';
import { checkFormula } from './check-formula.js';

const names: Record<string, Quantity> = {
  engineTemp: 'temperature',
  hoseTemp: 'temperature',
  drop: 'temperatureDelta',
  capRating: 'pressure',
  egPercent: 'percentage',
  holdMinutes: 'time',
  litres: 'volume',
  x: 'number',
};

function problemsOf(source: string, expect: 'condition' | Quantity = 'condition') {
  const result = checkFormula(source, { names, expect });
  return result.ok ? [] : result.problems;
}

function valueOf(
  source: string,
  values: Record<string, number>,
  expect: 'condition' | Quantity = 'condition',
) {
  const result = checkFormula(source, { names, expect });
  if (!result.ok) throw new Error(result.problems.map((p) => p.message).join(' '));
  const evaluated = result.evaluate(values);
  if (!evaluated.ok) throw new Error(evaluated.reason);
  return evaluated.value;
}

describe('hostile formulas are refused', () => {
  const hostile: Array<[string, RegExp]> = [
    ['f(x) = 1', /cannot define functions/],
    ['a = 1', /cannot assign/],
    ['x = 1', /cannot assign/],
    ['import({})', /import\(\) is not available/],
    ['createUnit("x")', /createUnit\(\) is not available/],
    ['evaluate("1")', /evaluate\(\) is not available/],
    ['parse("1 + 1")', /parse\(\) is not available/],
    ['compile("1")', /compile\(\) is not available/],
    ['[].constructor', /cannot read properties/],
    ['x.constructor', /cannot read properties/],
    ['x["constructor"]', /cannot read properties/],
    ['cos.constructor("return 1")', /Only the listed functions can be called/],
    ['cos.constructor("return 1")()', /could not be read/],
    ['{a: 1}', /cannot contain objects/],
    ['[1, 2]', /cannot contain lists/],
    ['1; 2', /one expression/],
    ['1:3', /Ranges written with ":"/],
    ['"text" == "text"', /text in quotes/],
    ['engineTemp > 90; import({})', /one expression/],
    ['cos(x) > 0', /no function called cos\(\)/],
    ['x mod 2 == 0', /remainder/],
    ['x! > 1', /factorial/],
    ['engineTemp to degF > 1', /unit conversion/],
    ['egPercent > 40%', /plain numbers/],
    ['2 x > 1', /Write "\*"/],
    ['max > 1', /max is a function/],
    ['engineTemp > degC', /straight after a number/],
  ];

  it.each(hostile)('%s', (source, message) => {
    const problems = problemsOf(source);
    expect(problems.length).toBeGreaterThan(0);
    expect(
      problems
        .map((p) => p.code)
        .every((c) => c === 'formula-not-allowed' || c === 'formula-syntax'),
    ).toBe(true);
    expect(problems.map((p) => p.message).join(' ')).toMatch(message);
  });

  it('refuses names that are not declared, and suggests a near miss', () => {
    const problems = problemsOf('enginetemp > 90');
    expect(problems).toEqual([
      {
        code: 'unknown-name',
        message:
          '"enginetemp" is not a reading or computed value of this tree; did you mean "engineTemp"?',
      },
    ]);
    expect(problemsOf('pi > 3')[0]?.code).toBe('unknown-name');
  });

  it('reports a syntax error as formula-syntax', () => {
    expect(problemsOf('engineTemp >')[0]?.code).toBe('formula-syntax');
  });
});

describe('units in formulas', () => {
  it.each([
    ['engineTemp > 1 bar', /compares a temperature with a pressure/],
    ['engineTemp + hoseTemp > 100', /adds two temperatures/],
    ['engineTemp > drop', /compares a temperature with a temperature difference/],
    ['drop > 9 degF', /compares a temperature difference with a temperature/],
    ['capRating * engineTemp > 1', /multiplies with a temperature/],
    ['-(40 degF) < engineTemp', /Negating a temperature/],
    ['egPercent > 20 and capRating', /must be a yes\/no result/],
    ['waterBoilingPoint(engineTemp) > 100', /takes a pressure as its gauge pressure/],
    ['temperatureDrop(capRating, hoseTemp) > 3', /takes a temperature as its inlet temperature/],
    ['max(engineTemp, capRating) > 1', /mixes a temperature with a pressure/],
    ['(engineTemp > 90) > 1', /only be compared with == or !=/],
  ])('%s is a unit mismatch', (source, message) => {
    const problems = problemsOf(source);
    expect(problems[0]?.code).toBe('mismatched-units');
    expect(problems[0]?.message).toMatch(message);
  });

  it('checks a computed value against its declared quantity', () => {
    expect(problemsOf('engineTemp - hoseTemp', 'temperatureDelta')).toEqual([]);
    expect(problemsOf('engineTemp - hoseTemp', 'temperature')[0]?.message).toMatch(
      /gives a temperature difference, but a temperature is needed/,
    );
    expect(problemsOf('litres / holdMinutes', 'volume')[0]?.message).toMatch(/a value in L\/min/);
  });

  it('reads a number followed by a unit in canonical units', () => {
    expect(valueOf('engineTemp >= 221 degF', { engineTemp: 105 })).toBe(true);
    expect(valueOf('engineTemp > -40 degF', { engineTemp: -39.9 })).toBe(true);
    expect(valueOf('capRating >= 15 psi', { capRating: 1.03 })).toBe(false);
    expect(valueOf('drop < 9 K', { drop: 8 })).toBe(true);
    expect(valueOf('holdMinutes >= 600 s', { holdMinutes: 10 })).toBe(true);
  });
});

describe('allowed formulas evaluate on plain canonical numbers', () => {
  it('handles arithmetic, comparisons, logic and conditionals', () => {
    expect(
      valueOf('engineTemp - hoseTemp > 25 and engineTemp >= 100', {
        engineTemp: 110,
        hoseTemp: 45,
      }),
    ).toBe(true);
    expect(valueOf('not (x > 2) or x == 10', { x: 10 })).toBe(true);
    expect(valueOf('x > 1 xor x > 2', { x: 3 })).toBe(false);
    expect(valueOf('(x > 2 ? x : 0) * 2', { x: 3 }, 'number')).toBe(6);
    expect(valueOf('x ^ 2 + 1', { x: 3 }, 'number')).toBe(10);
  });

  it('chains comparisons', () => {
    expect(valueOf('82 <= engineTemp <= 91', { engineTemp: 85 })).toBe(true);
    expect(valueOf('82 <= engineTemp <= 91', { engineTemp: 95 })).toBe(false);
  });

  it('compares with a tolerance so computed differences meet round thresholds', () => {
    expect(100.7 - 90.4 >= 10.3).toBe(false);
    expect(valueOf('engineTemp - hoseTemp >= 10.3 K', { engineTemp: 100.7, hoseTemp: 90.4 })).toBe(
      true,
    );
    expect(valueOf('engineTemp - hoseTemp > 10.3 K', { engineTemp: 100.7, hoseTemp: 90.4 })).toBe(
      false,
    );
  });

  it('calls the whitelisted functions', () => {
    expect(
      valueOf('max(engineTemp, hoseTemp)', { engineTemp: 90, hoseTemp: 95 }, 'temperature'),
    ).toBe(95);
    expect(
      valueOf('mean(engineTemp, hoseTemp)', { engineTemp: 90, hoseTemp: 80 }, 'temperature'),
    ).toBe(85);
    expect(valueOf('round(abs(drop), 1)', { drop: -3.14159 }, 'temperatureDelta')).toBe(3.1);
    expect(
      valueOf(
        'temperatureDrop(engineTemp, hoseTemp)',
        { engineTemp: 90, hoseTemp: 84 },
        'temperatureDelta',
      ),
    ).toBe(6);
  });

  it('calls the coolant functions from @heatpath/coolant', () => {
    // IAPWS-IF97 saturation temperature at 1.0 bar gauge (2.01325 bar absolute): 120.42 °C (trade-facts.md).
    const boiling = valueOf('waterBoilingPoint(capRating)', { capRating: 1 }, 'temperature');
    expect(boiling).toBeCloseTo(120.42, 1);
    // ASHRAE EG table: 47.6 vol % freezes at -33.8 °C (trade-facts.md, source A).
    const freezing = valueOf('egFreezePoint(egPercent)', { egPercent: 47.6 }, 'temperature');
    expect(freezing).toBeCloseTo(-33.8, 0);
  });

  it('reports a missing value or a function with no figure without throwing', () => {
    const check = checkFormula('egFreezePoint(egPercent) > -30 degC', {
      names,
      expect: 'condition',
    });
    if (!check.ok) throw new Error('should check');
    expect(check.evaluate({})).toMatchObject({ ok: false, missing: 'egPercent' });
    expect(check.evaluate({ egPercent: 80 }).ok).toBe(false);
  });

  it('stops "or" early, so a later part with no figure does not spoil it', () => {
    expect(
      valueOf('egPercent > 60 or egFreezePoint(egPercent) > -24 degC', { egPercent: 80 }),
    ).toBe(true);
  });
});
