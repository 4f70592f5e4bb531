// The temperature-difference verdicts, checked against the rule in trade-facts.md ("trade article;
// low–medium"): around 5–6 K engine-out versus engine-in when flow is right; much more → flow
// problem; much less → air-side problem. The band edges are Heatpath's own and tested as such.
import { describe, expect, it } from 'vitest';
import { CoolantInputError } from './errors.js';
import { assessTemperatureDrop } from './temperature-drop.js';

describe('assessTemperatureDrop — engine-out vs engine-in around 5–6 K (trade article; low–medium)', () => {
  it.each([
    [84, 89.5, 'normal'], // 5.5 K, the published figure itself
    [84, 90, 'normal'], // 6 K
    [80, 95, 'low-flow-suspected'], // 15 K, "much more"
    [93, 94, 'air-side-suspected'], // 1 K, "much less"
  ] as const)('engine in %d °C, out %d °C → %s', (inletCelsius, outletCelsius, verdict) => {
    const r = assessTemperatureDrop({ circuit: 'engine', inletCelsius, outletCelsius });
    expect(r.verdict).toBe(verdict);
    expect(r.rule.source.status).toBe('trade article; low–medium');
    expect(r.rule.bandSource.status).toMatch(/Heatpath choice/);
  });

  it.each([
    [95, 89.5, 'normal'],
    [100, 80, 'low-flow-suspected'],
    [96, 95, 'air-side-suspected'],
  ] as const)(
    'radiator in %d °C, out %d °C → %s (engine rule applied by energy balance)',
    (inletCelsius, outletCelsius, verdict) => {
      expect(
        assessTemperatureDrop({ circuit: 'radiator', inletCelsius, outletCelsius }).verdict,
      ).toBe(verdict);
    },
  );

  it('band edges: 3 K and 10 K are normal, just outside is not (Heatpath working band)', () => {
    const at = (outletCelsius: number) =>
      assessTemperatureDrop({ circuit: 'engine', inletCelsius: 85, outletCelsius }).verdict;
    expect(at(88)).toBe('normal');
    expect(at(95)).toBe('normal');
    expect(at(87.9)).toBe('air-side-suspected');
    expect(at(95.1)).toBe('low-flow-suspected');
  });

  it('readings reversed beyond 2 K, or outside the liquid range of coolant, are implausible', () => {
    expect(
      assessTemperatureDrop({ circuit: 'radiator', inletCelsius: 80, outletCelsius: 90 }).verdict,
    ).toBe('implausible');
    expect(
      assessTemperatureDrop({ circuit: 'engine', inletCelsius: 95, outletCelsius: 85 }).verdict,
    ).toBe('implausible');
    expect(
      assessTemperatureDrop({ circuit: 'engine', inletCelsius: 90, outletCelsius: 180 }).verdict,
    ).toBe('implausible');
    // within IR reading error of zero: not implausible, just a tiny difference
    expect(
      assessTemperatureDrop({ circuit: 'radiator', inletCelsius: 90, outletCelsius: 91 }).verdict,
    ).toBe('air-side-suspected');
  });

  it('warns when the thermostat may still be closed (opening usually 82–91 °C; published trade textbook site; medium)', () => {
    const r = assessTemperatureDrop({ circuit: 'engine', inletCelsius: 60, outletCelsius: 66 });
    expect(r.warnings.map((w) => w.code)).toContain('thermostat-may-be-closed');
  });

  it('the heater band is marked as Heatpath’s own, not published', () => {
    const r = assessTemperatureDrop({
      circuit: 'heater',
      inletCelsius: '194 degF',
      outletCelsius: '176 degF',
    });
    expect(r.verdict).toBe('normal'); // 10 K
    expect(r.warnings.map((w) => w.code)).toContain('no-published-band');
    expect(r.rule.source.status).toMatch(/Heatpath choice/);
  });

  it('rejects a wrong circuit or a non-temperature', () => {
    expect(() =>
      assessTemperatureDrop({
        circuit: 'gearbox' as 'engine',
        inletCelsius: 80,
        outletCelsius: 85,
      }),
    ).toThrow(CoolantInputError);
    expect(() =>
      assessTemperatureDrop({ circuit: 'engine', inletCelsius: '5 kg', outletCelsius: 85 }),
    ).toThrow(CoolantInputError);
  });
});
