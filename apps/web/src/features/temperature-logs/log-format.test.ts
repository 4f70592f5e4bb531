// The logs screen's wording of times and temperatures, and which log figures a step's box is
// offered: same quantity only, the ones the package names for that input first.
import type { CandidateReading } from '@heatpath/contracts';
import type { MeasurementInput } from '@heatpath/fault-tree';
import { describe, expect, it } from 'vitest';
import { fittingCandidates } from './components/use-in-walk';
import { formatClock, formatDuration, temperatureDisplay } from './log-format';

const basis = { method: 'm', status: 's' };
const candidate = (
  name: CandidateReading['name'],
  quantity: CandidateReading['quantity'],
  matchesInputs: string[] = [],
): CandidateReading => ({
  name,
  value: 88.4,
  unit: quantity === 'time' ? 'min' : 'degC',
  quantity,
  label: name,
  atSeconds: null,
  matchesInputs,
  basis,
  needsConfirmation: true,
});

describe('log wording', () => {
  it('writes moments and durations', () => {
    expect(formatClock(0)).toBe('0:00');
    expect(formatClock(754)).toBe('12:34');
    expect(formatClock(3600 + 65)).toBe('1:01:05');
    expect(formatDuration(45)).toBe('45 s');
    expect(formatDuration(151)).toBe('2 min 31 s');
    expect(formatDuration(3900)).toBe('1 h 5 min');
  });

  it('shows temperatures, differences and rates in the person’s unit', () => {
    const c = temperatureDisplay({ temperature: 'C', pressure: 'bar', volume: 'L' });
    const f = temperatureDisplay({ temperature: 'F', pressure: 'bar', volume: 'L' });
    expect(c.format(88.44)).toBe('88.4 °C');
    expect(f.format(110, 0)).toBe('230 °F');
    expect(f.fromC(100)).toBeCloseTo(212, 9);
    expect(f.toC(212)).toBeCloseTo(100, 9);
    expect(c.formatDelta(5)).toBe('5 K');
    expect(f.formatDelta(5)).toBe('9 °F');
    expect(f.formatRate(-2)).toBe('−3.6 °F/min');
  });
});

describe('fittingCandidates', () => {
  const input = (name: string, quantity: MeasurementInput['quantity']): MeasurementInput => ({
    name,
    label: name,
    quantity,
    unit: quantity === 'time' ? 'min' : 'degC',
    range: { min: 0, max: 200 },
  });
  const all = [
    candidate('peakCoolantC', 'temperature'),
    candidate('settledCoolantC', 'temperature', ['settledTemp']),
    candidate('minutesToTargetC', 'time', ['minutesTo80']),
  ];

  it('offers only figures of the same quantity, the named ones first', () => {
    expect(fittingCandidates(input('settledTemp', 'temperature'), all)).toEqual([
      { candidate: all[1], suggested: true },
      { candidate: all[0], suggested: false },
    ]);
    expect(fittingCandidates(input('minutesTo80', 'time'), all)).toEqual([
      { candidate: all[2], suggested: true },
    ]);
    expect(fittingCandidates(input('topUpLitres', 'volume'), all)).toEqual([]);
  });
});
