// Pressure-test verdicts against the rule in trade-facts.md: hold at cap rating 10–30 min; the
// gauge should not fall ("common practice, no numeric allowable drop published"). The numeric
// thresholds are Heatpath's own (pressureHoldRule) and are tested as such; the psi ↔ bar figures
// are checked against js-quantities, a conversion library outside the project.
import Qty from 'js-quantities';
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { pressureHoldRule, pressureTest } from './pressure-test.js';

const psiToBar = (psi: number): number => Qty(psi, 'psi').to('bar').scalar;

function verdictOf(startBar: number, endBar: number, minutes: number, capRatingBar = 1.4): string {
  return pressureTest({ startBar, endBar, minutes, capRatingBar }).verdict;
}

describe('pressureHoldRule — Heatpath choices around a common-practice rule', () => {
  it('exports one rule with the thresholds the trees build their formulas from', () => {
    expect(pressureHoldRule).toEqual({
      noChangeBar: 0.05,
      fastLeakBarPerMinute: 0.02,
      minimumMinutes: 10,
      maxOverRatingFraction: 0.1,
      minStartFractionOfRating: 0.9,
    });
  });

  it('the result carries the same object, so the calculator shows the rule it applied', () => {
    const r = pressureTest({ startBar: 1.4, endBar: 1.4, minutes: 15, capRatingBar: 1.4 });
    expect(r.rule.thresholds).toBe(pressureHoldRule);
    expect(r.rule.source.status).toBe('common practice, no numeric allowable drop published');
    expect(r.rule.text).toContain('0.05 bar');
    expect(r.rule.text).toContain('0.02 bar/min');
  });
});

describe('pressureTest — common practice, no numeric allowable drop published', () => {
  it('holds: no fall over 15 min at the cap rating', () => {
    expect(verdictOf(1.4, 1.4, 15)).toBe('holds');
  });

  it('holds within the no-change band (Heatpath: 0.05 bar, gauge reading resolution)', () => {
    expect(verdictOf(1.1, 1.06, 20, 1.1)).toBe('holds');
  });

  it('slow leak: 0.2 bar lost in 20 min (0.01 bar/min)', () => {
    expect(verdictOf(1.1, 0.9, 20, 1.1)).toBe('slow-leak');
  });

  it('a 0.69 bar loss in 10 minutes is a fast, clear leak, not a slow one (issue 13)', () => {
    const r = pressureTest({ startBar: 1.4, endBar: 0.71, minutes: 10, capRatingBar: 1.4 });
    expect(r.verdict).toBe('fast-leak');
    expect(r.explanation).toContain('clear leak');
  });

  it('fast leak: 1 bar lost in 3 min, even though the hold was short', () => {
    expect(verdictOf(1.1, 0.1, 3, 1.1)).toBe('fast-leak');
  });

  it('the fast/slow boundary sits at 0.02 bar/min', () => {
    expect(verdictOf(1.4, 1.2, 10)).toBe('fast-leak');
    expect(verdictOf(1.4, 1.21, 10)).toBe('slow-leak');
  });

  it('not at rating: started at 0.5 bar on a 1.1 bar cap', () => {
    expect(verdictOf(0.5, 0.5, 15, 1.1)).toBe('not-at-rating');
  });

  it('too short: no fall in 5 min is not yet a pass (the rule asks 10–30 min)', () => {
    expect(verdictOf(1.1, 1.1, 5, 1.1)).toBe('too-short');
  });

  it('pressure rose on a cold stopped engine: the system is still warming, not combustion gas (trade brief)', () => {
    const r = pressureTest({ startBar: 1.0, endBar: 1.3, minutes: 15, capRatingBar: 1.0 });
    expect(r.verdict).toBe('pressure-rose');
    expect(r.explanation).toContain('still warming');
    expect(r.explanation).not.toMatch(/combustion gas/i);
    const rose = r.warnings.find((w) => w.code === 'pressure-rose');
    expect(rose?.message).toContain('A stopped engine makes no combustion gas');
  });

  it('reads psi: 15 psi held to 14 psi over 15 min on a 15 psi cap is a slow leak (1 psi = 0.0689 bar, js-quantities)', () => {
    const r = pressureTest({
      startBar: '15 psi',
      endBar: '14 psi',
      minutes: '15 min',
      capRatingBar: '15 psi',
    });
    expect(r.verdict).toBe('slow-leak');
    expect(r.dropBar).toBeCloseTo(psiToBar(1), 6);
  });
});

describe('pressureTest — the cap rating (common practice: 1.4–1.6 bar common, 0.9–1.2 bar older)', () => {
  const codes = (cap: number): string[] =>
    pressureTest({ startBar: cap, endBar: cap, minutes: 15, capRatingBar: cap }).warnings.map(
      (w) => w.code,
    );

  it.each([0.9, 1.0, 1.2, 1.4, 1.5, 1.6, 2.0])('no warning on an ordinary %s bar cap', (cap) => {
    expect(codes(cap)).toEqual(['test-warm-system']);
  });

  it.each([0.3, 2.5])('warns on an unusual %s bar cap', (cap) => {
    expect(codes(cap)).toContain('unusual-cap-rating');
  });

  it('refuses a 30 bar cap with a sentence naming the usual ratings', () => {
    expect(() => verdictOf(30, 30, 15, 30)).toThrow(/No road-vehicle pressure cap/);
    try {
      verdictOf(1, 1, 15, 30);
    } catch (error) {
      expect(error).toBeInstanceOf(CoolantInputError);
      expect((error as CoolantInputError).field).toBe('capRatingBar');
    }
  });

  it('refuses a test started more than 10 % above the cap rating (2.5 bar on a 1.0 bar cap, issue 13)', () => {
    expect(() => verdictOf(2.5, 2.5, 15, 1.0)).toThrow(CoolantInputError);
    expect(() => verdictOf(2.5, 2.5, 15, 1.0)).toThrow(/above the 1.00 bar cap rating/);
    // Up to 10 % over is a pump stroke's overshoot and is read normally.
    expect(verdictOf(1.1, 1.1, 15, 1.0)).toBe('holds');
  });
});

describe('pressureTest — impossible input is refused', () => {
  const refused = (o: Parameters<typeof pressureTest>[0], field: string): void => {
    try {
      pressureTest(o);
      expect.fail('expected a CoolantInputError');
    } catch (error) {
      expect(error).toBeInstanceOf(CoolantInputError);
      expect((error as CoolantInputError).field).toBe(field);
    }
  };

  it('refuses nonsense, naming the box at fault', () => {
    refused({ startBar: 1, endBar: 1, minutes: -5, capRatingBar: 1 }, 'minutes');
    refused({ startBar: 1, endBar: 1, minutes: 0, capRatingBar: 1 }, 'minutes');
    refused({ startBar: 1, endBar: 1, minutes: 2000, capRatingBar: 1 }, 'minutes');
    refused({ startBar: 1, endBar: 1, minutes: 10, capRatingBar: 0 }, 'capRatingBar');
    refused({ startBar: '1 L', endBar: 1, minutes: 10, capRatingBar: 1 }, 'startBar');
    refused({ startBar: 0, endBar: 0, minutes: 10, capRatingBar: 1 }, 'startBar');
    refused({ startBar: 1, endBar: -0.2, minutes: 10, capRatingBar: 1 }, 'endBar');
    refused({ startBar: 1, endBar: 5, minutes: 10, capRatingBar: 1 }, 'endBar');
  });
});
