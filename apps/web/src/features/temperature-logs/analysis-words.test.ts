// The results cards' words about the opening and a pump shroud, from analysis results shaped as
// the API returns them (invented figures). The trade rules they carry are common practice, from
// the brief's traps list (cooling-diagnosis.md, common practice): a map-controlled thermostat
// at 100–110 °C is normal at part load; a stall that climbs on is the shroud, not the opening.
import { defaultUnitPreferences } from '@heatpath/contracts';
import type { TemperatureLogAnalysis } from '@heatpath/contracts';
import { describe, expect, it } from 'vitest';
import { openingDetail, shroudReleaseCard } from './analysis-words';
import { temperatureDisplay } from './log-format';

const display = temperatureDisplay(defaultUnitPreferences);
const basis = { method: 'How.', status: 'Standing.' };

type Opening = Extract<TemperatureLogAnalysis['opening'], { found: true }>;

const opening: Opening = {
  found: true,
  temperatureC: 105.2,
  atSeconds: 625,
  typicalRangeC: { min: 82, max: 110 },
  comparedWithTypical: 'within',
  shape: 'sharp',
  note: 'Normal for a map-controlled thermostat at part load.',
  basis,
};

function analysisWith(
  shroudRelease: TemperatureLogAnalysis['shroudRelease'],
  switchablePump: boolean | null,
): TemperatureLogAnalysis {
  return {
    shroudRelease,
    options: { switchablePump },
  } as unknown as TemperatureLogAnalysis;
}

describe('opening words', () => {
  it('puts the note for a map-controlled thermostat beside the comparison', () => {
    expect(openingDetail(opening, display)).toBe(
      'at 10:25 into the log; within the usual 82 °C–110 °C. Normal for a map-controlled thermostat at part load.',
    );
  });

  it('reads an analysis stored before the note existed', () => {
    const { note: _note, ...old } = opening;
    expect(openingDetail({ ...old, comparedWithTypical: 'above' } as Opening, display)).toBe(
      'at 10:25 into the log; above the usual 82 °C–110 °C.',
    );
  });
});

describe('pump shroud card', () => {
  const stall: TemperatureLogAnalysis['shroudRelease'] = {
    found: true,
    atSeconds: 250,
    temperatureC: 69.4,
    dipK: 3.1,
    resumedAtSeconds: 300,
    reading: 'shroud-release-or-early-opening',
    note: 'If the engine has a switchable coolant pump, this is most likely its shroud releasing; if it has not, it may be the thermostat starting to open early.',
    basis,
  };

  it('gives both readings of a stall when the engine is not known', () => {
    const card = shroudReleaseCard(analysisWith(stall, null), display);
    expect(card?.title).toBe('Stall in the warm-up (pump shroud or early opening)');
    expect(card?.figure).toBe('69.4 °C');
    expect(card?.detail).toMatch(/^at 4:10 into the log\. If the engine has a switchable/);
  });

  it('names the shroud when the engine has the pump, and says when none showed', () => {
    const known = shroudReleaseCard(
      analysisWith({ ...stall, reading: 'shroud-release' }, true),
      display,
    );
    expect(known?.title).toBe('Coolant pump shroud released');
    const none = shroudReleaseCard(
      analysisWith({ found: false, reason: 'No stall showed during the warm-up.', basis }, true),
      display,
    );
    expect(none).toMatchObject({ missing: true, figure: 'No stall showed during the warm-up.' });
  });

  it('shows nothing without a stall on an engine not known to have the pump, nor for old analyses', () => {
    const none = { found: false as const, reason: 'No stall showed during the warm-up.', basis };
    expect(shroudReleaseCard(analysisWith(none, null), display)).toBeNull();
    expect(shroudReleaseCard(analysisWith(none, false), display)).toBeNull();
    expect(
      shroudReleaseCard({ options: {} } as unknown as TemperatureLogAnalysis, display),
    ).toBeNull();
  });
});
