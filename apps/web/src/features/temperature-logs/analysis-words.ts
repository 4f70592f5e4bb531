// The sentences the results cards say about the thermostat opening and a switchable pump's
// shroud releasing, kept apart from the cards so they can be checked without rendering. The
// package's notes carry the trade reasoning (a map-controlled thermostat's normal 100–110 °C, a
// stall that is the shroud rather than the opening); these only put them beside the figures.
import type { TemperatureLogAnalysis } from '@heatpath/contracts';
import { atMoment, type TemperatureDisplay } from './log-format';

type Opening = Extract<TemperatureLogAnalysis['opening'], { found: true }>;

const comparedWords = { below: 'below', within: 'within', above: 'above' } as const;

/** "at 10:25 into the log; within the usual 82–91 °C." plus the package's note, if any. */
export function openingDetail(opening: Opening, display: TemperatureDisplay): string {
  const range = `${display.format(opening.typicalRangeC.min, 0)}–${display.format(opening.typicalRangeC.max, 0)}`;
  const compared = `${atMoment(opening.atSeconds)}; ${comparedWords[opening.comparedWithTypical]} the usual ${range}.`;
  // Analyses stored before the note existed have none; the API works them out again, but a
  // missing note must never break the card.
  const note = opening.note ?? null;
  return note === null ? compared : `${compared} ${note}`;
}

export interface ShroudReleaseCard {
  title: string;
  figure: string;
  detail: string | null;
  missing: boolean;
}

/**
 * The card for a stall in the warm-up: shown when there is one, or when the engine is known to
 * have a switchable pump (then its absence is worth saying). Nothing for an engine known to have
 * none, nor for an unknown engine whose warm-up ran without a stall.
 */
export function shroudReleaseCard(
  analysis: TemperatureLogAnalysis,
  display: TemperatureDisplay,
): ShroudReleaseCard | null {
  const release = analysis.shroudRelease as TemperatureLogAnalysis['shroudRelease'] | undefined;
  if (release === undefined) return null;
  if (release.found) {
    return {
      title:
        release.reading === 'shroud-release'
          ? 'Coolant pump shroud released'
          : 'Stall in the warm-up (pump shroud or early opening)',
      figure: display.format(release.temperatureC),
      detail: `${atMoment(release.atSeconds)}. ${release.note}`,
      missing: false,
    };
  }
  if (analysis.options.switchablePump !== true) return null;
  return {
    title: 'Coolant pump shroud released',
    figure: release.reason,
    detail: null,
    missing: true,
  };
}
