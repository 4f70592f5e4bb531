// What a stall in the warm-up (the coolant pausing or dipping, then climbing on) means. On an
// engine with a switchable coolant pump the shroud covers the impeller while the engine warms,
// so the coolant stands still; when it releases (around 70 °C on many engines) the coolant
// starts moving, the sensor briefly sees cooler coolant, and the climb continues
// (cooling-diagnosis.md; common practice). That stall is not the thermostat opening. Whether the
// engine has such a pump is an option: when it is not known, both readings are given.
import type { Stall } from './opening-search.js';
import type { ResultBasis } from './result-basis.js';
import { STATUS } from './result-basis.js';
import type { NotFound } from './warm-up.js';

export type ShroudReleaseReading = 'shroud-release' | 'shroud-release-or-early-opening';

export type ShroudReleaseResult =
  | {
      readonly found: true;
      readonly atSeconds: number;
      readonly temperatureC: number;
      /** How far the coolant dipped before climbing on, K (0: it only paused). */
      readonly dipK: number;
      readonly resumedAtSeconds: number;
      readonly reading: ShroudReleaseReading;
      readonly note: string;
      readonly basis: ResultBasis;
    }
  | NotFound;

export interface StallReadings {
  readonly shroudRelease: ShroudReleaseResult;
  /** Notes on the other stalls, which are neither the opening nor the shroud. */
  readonly notes: readonly string[];
}

function one(value: number): string {
  return (Math.round(value * 10) / 10).toString();
}

function what(stall: Stall): string {
  return stall.dipK >= 0.5
    ? `dipped ${one(stall.dipK)} K at ${one(stall.temperatureC)} °C`
    : `stalled at ${one(stall.temperatureC)} °C`;
}

export function readStalls(options: {
  stalls: readonly Stall[];
  timeAt: (index: number) => number;
  switchablePump: boolean | null;
  /** The opening found after the stalls, °C, or null. */
  openingC: number | null;
  warmUpFound: boolean;
}): StallReadings {
  const { stalls, timeAt, switchablePump, openingC, warmUpFound } = options;
  const basis: ResultBasis = {
    method:
      'A moment in the warm-up where the smoothed coolant temperature stops rising (or dips) and then climbs on: within the resume window it rises well above that point again, picking up speed.',
    status: `${STATUS.heatpathMethod} Whether the engine has a switchable coolant pump comes from the case’s vehicle; the maker’s description of the pump governs.`,
  };
  const opened =
    openingC === null
      ? ''
      : ` Heatpath took the later levelling-off at ${one(openingC)} °C for the thermostat opening.`;
  const pauseNote = (stall: Stall): string =>
    `The warm-up ${what(stall)} and then climbed on (a stop in traffic, idling, or the thermostat starting to open early); it is not taken for the opening.`;

  if (switchablePump === false) {
    return {
      shroudRelease: {
        found: false,
        reason: 'The engine has no switchable coolant pump.',
        basis,
      },
      notes: stalls.map(pauseNote),
    };
  }
  const [first, ...rest] = stalls;
  if (first === undefined) {
    let reason: string;
    if (!warmUpFound) {
      reason = 'There is no warm-up in this log, so a shroud releasing cannot show.';
    } else if (switchablePump === true) {
      reason =
        'No stall showed during the warm-up. On some engines the shroud releasing barely shows at the sensor; a shroud that never covers the impeller (its valve never switched) gives no stall and a slower warm-up, without overheating.';
    } else {
      reason = 'No stall showed during the warm-up.';
    }
    return { shroudRelease: { found: false, reason, basis }, notes: [] };
  }
  const note =
    switchablePump === true
      ? `The coolant ${what(first)} and then climbed on: on this engine’s switchable coolant pump that is the shroud releasing, so the coolant starts to move through the engine. It is not the thermostat opening.${opened}`
      : `The coolant ${what(first)} and then climbed on. If the engine has a switchable coolant pump, this is most likely its shroud releasing; if it has not, it may be the thermostat starting to open early. Check which before judging the thermostat.${opened}`;
  return {
    shroudRelease: {
      found: true,
      atSeconds: timeAt(first.index),
      temperatureC: first.temperatureC,
      dipK: first.dipK,
      resumedAtSeconds: timeAt(first.resumedIndex),
      reading: switchablePump === true ? 'shroud-release' : 'shroud-release-or-early-opening',
      note,
      basis,
    },
    notes: rest.map(pauseNote),
  };
}
