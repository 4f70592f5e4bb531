// Pressure-test verdicts against the rule in trade-facts.md: hold at cap rating 10–30 min; the
// gauge should not fall ("common practice, no numeric allowable drop published"). The thresholds
// are Heatpath's own and tested as such.
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { pressureTest } from './pressure-test.js';

describe('pressureTest — common practice, no numeric allowable drop published', () => {
  it('holds: no fall over 15 min at the cap rating', () => {
    const r = pressureTest({ startBar: 1.1, endBar: 1.1, minutes: 15, capRatingBar: 1.1 });
    expect(r.verdict).toBe('holds');
    expect(r.rule.source.status).toBe('common practice, no numeric allowable drop published');
  });

  it('holds within the gauge reading resolution (Heatpath: 0.05 bar)', () => {
    expect(
      pressureTest({ startBar: 1.1, endBar: 1.06, minutes: 20, capRatingBar: 1.1 }).verdict,
    ).toBe('holds');
  });

  it('slow leak: 0.2 bar lost in 20 min', () => {
    expect(
      pressureTest({ startBar: 1.1, endBar: 0.9, minutes: 20, capRatingBar: 1.1 }).verdict,
    ).toBe('slow-leak');
  });

  it('fast leak: 1 bar lost in 3 min, even though the hold was short', () => {
    expect(
      pressureTest({ startBar: 1.1, endBar: 0.1, minutes: 3, capRatingBar: 1.1 }).verdict,
    ).toBe('fast-leak');
  });

  it('not at rating: started at 0.5 bar on a 1.1 bar cap', () => {
    expect(
      pressureTest({ startBar: 0.5, endBar: 0.5, minutes: 15, capRatingBar: 1.1 }).verdict,
    ).toBe('not-at-rating');
  });

  it('too short: no fall in 5 min is not yet a pass (the rule asks 10–30 min)', () => {
    expect(
      pressureTest({ startBar: 1.1, endBar: 1.1, minutes: 5, capRatingBar: 1.1 }).verdict,
    ).toBe('too-short');
  });

  it('pressure rose: points at combustion gas (block test)', () => {
    const r = pressureTest({ startBar: 1.0, endBar: 1.3, minutes: 15, capRatingBar: 1.0 });
    expect(r.verdict).toBe('pressure-rose');
  });

  it('reads psi: 15 psi held to 14 psi over 15 min on a 15 psi cap is a slow leak (1 psi = 0.069 bar)', () => {
    const r = pressureTest({
      startBar: '15 psi',
      endBar: '14 psi',
      minutes: '15 min',
      capRatingBar: '15 psi',
    });
    expect(r.verdict).toBe('slow-leak');
    expect(r.dropBar).toBeCloseTo(0.0689476, 6);
  });

  it('warns on a cap outside the typical 0.8–1.2 bar (common practice) and on testing above the rating', () => {
    const r = pressureTest({ startBar: 2.0, endBar: 2.0, minutes: 15, capRatingBar: 1.5 });
    expect(r.warnings.map((w) => w.code)).toEqual([
      'test-warm-system',
      'unusual-cap-rating',
      'above-cap-rating',
    ]);
  });

  it('rejects nonsense', () => {
    expect(() => pressureTest({ startBar: 1, endBar: 1, minutes: -5, capRatingBar: 1 })).toThrow(
      CoolantInputError,
    );
    expect(() => pressureTest({ startBar: 1, endBar: 1, minutes: 0, capRatingBar: 1 })).toThrow(
      CoolantInputError,
    );
    expect(() => pressureTest({ startBar: 1, endBar: 1, minutes: 10, capRatingBar: 0 })).toThrow(
      CoolantInputError,
    );
    expect(() =>
      pressureTest({ startBar: '1 L', endBar: 1, minutes: 10, capRatingBar: 1 }),
    ).toThrow(CoolantInputError);
    expect(() => pressureTest({ startBar: 1, endBar: -0.2, minutes: 10, capRatingBar: 1 })).toThrow(
      CoolantInputError,
    );
  });
});
