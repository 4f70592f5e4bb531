// Compares an opening (or regulating) temperature with what is usual, in words that do not call
// a normal engine faulty. Engines with a map-controlled thermostat hold 100–110 °C at part load
// (cooling-diagnosis.md, traps a skilled technician avoids; common practice): for them a figure
// there is normal, and when it is not known whether the engine has one, the words say it may be.
// An opening below the usual range is told apart from a switchable pump's shroud releasing: the
// opening search only keeps a levelling-off after which the climb does not resume, which a
// shroud release is not, and the note says so where a switchable pump is possible.
import { MAP_CONTROLLED_PART_LOAD_C, TYPICAL_OPENING_C } from './result-basis.js';

export interface OpeningComparison {
  readonly typicalRangeC: { readonly min: number; readonly max: number };
  readonly comparedWithTypical: 'below' | 'within' | 'above';
  /** Why the comparison says what it says, when it needs saying; null otherwise. */
  readonly note: string | null;
}

function format(c: number): string {
  return (Math.round(c * 10) / 10).toString();
}

function belowNote(openingC: number, switchablePump: boolean | null): string | null {
  if (switchablePump === false) {
    return null;
  }
  const lead =
    switchablePump === true
      ? 'This engine’s switchable coolant pump releases its shroud during the warm-up'
      : 'If the engine has a switchable coolant pump, its shroud releasing';
  const rest =
    switchablePump === true
      ? ', which gives a brief stall, but the climb then continues.'
      : ' gives a brief stall, but the climb then continues.';
  return `${lead}${rest} Here the coolant stayed near ${format(openingC)} °C without climbing on, so a thermostat opening early (or stuck partly open) is the likelier reading.`;
}

export function compareOpening(
  openingC: number,
  facts: { mapControlledThermostat: boolean | null; switchablePump: boolean | null },
): OpeningComparison {
  const { mapControlledThermostat, switchablePump } = facts;
  const band = `${MAP_CONTROLLED_PART_LOAD_C.min}–${MAP_CONTROLLED_PART_LOAD_C.max} °C`;
  if (mapControlledThermostat === true) {
    const range = { min: TYPICAL_OPENING_C.min, max: MAP_CONTROLLED_PART_LOAD_C.max };
    if (openingC > range.max) {
      return { typicalRangeC: range, comparedWithTypical: 'above', note: null };
    }
    if (openingC < range.min) {
      return {
        typicalRangeC: range,
        comparedWithTypical: 'below',
        note: belowNote(openingC, switchablePump),
      };
    }
    return {
      typicalRangeC: range,
      comparedWithTypical: 'within',
      note:
        openingC > TYPICAL_OPENING_C.max
          ? `Normal for a map-controlled thermostat at part load: such engines hold ${band} and let the coolant drop toward 90 °C under full load (common practice).`
          : null,
    };
  }
  const range = TYPICAL_OPENING_C;
  if (openingC < range.min) {
    return {
      typicalRangeC: range,
      comparedWithTypical: 'below',
      note: belowNote(openingC, switchablePump),
    };
  }
  if (openingC <= range.max) {
    return { typicalRangeC: range, comparedWithTypical: 'within', note: null };
  }
  const mayBeMapControlled =
    mapControlledThermostat === null && openingC <= MAP_CONTROLLED_PART_LOAD_C.max;
  return {
    typicalRangeC: range,
    comparedWithTypical: 'above',
    note: mayBeMapControlled
      ? `Higher than a conventional thermostat opens, but engines with a map-controlled thermostat hold ${band} at part load, so ${format(openingC)} °C may be normal for this engine. Find out whether it has one before suspecting the thermostat.`
      : null,
  };
}
