// What Heatpath shipped before: the earlier definitions of each shipped tree, oldest first, and
// the change note a workshop sees when its copy moves on to the definition shipped now. The API
// uses this to publish the current definition as a new version in workshops whose latest
// published version is still one Heatpath shipped (not one their lead edited); cases pinned to
// the older versions keep reading them. Kept apart from the trees themselves so the web bundle
// never carries the history.
import type { TreeDefinition } from '../../schema/tree-schema.js';
import { treeDefinitionSchema } from '../../schema/tree-schema.js';
import coolantLevelDroppingV1 from './coolant-level-dropping.1.json' with { type: 'json' };
import overheatsIntermittentV1 from './overheats-intermittent-no-codes.1.json' with { type: 'json' };
import slowWarmUpV1 from './slow-warm-up-little-heat.1.json' with { type: 'json' };

export interface ShippedHistory {
  /** Definitions shipped before the current one, oldest first. */
  readonly earlier: readonly TreeDefinition[];
  /** Shown as the change note of the version that brings a workshop to the current definition. */
  readonly changeNote: string;
}

const parse = (definition: unknown): TreeDefinition => treeDefinitionSchema.parse(definition);

export const shippedHistory: Readonly<Record<string, ShippedHistory>> = {
  'overheats-intermittent-no-codes': {
    earlier: [parse(overheatsIntermittentV1)],
    changeNote:
      'Updated by Heatpath: the thermostat, sensor, hose-temperature, fan, cap, pressure and block checks now tell apart the cases that misled the earlier version, the switchable pump is checked at its valve and wiring before it is taken off, a refilled system is bled first, and every costly finding is confirmed before it is reached.',
  },
  'slow-warm-up-little-heat': {
    earlier: [parse(slowWarmUpV1)],
    changeNote:
      'Updated by Heatpath: the temperature sensor is checked before the thermostat is blamed, the switchable pump and the heater pump are checked at their command before they are condemned, the heater valve and a thermostat’s heater element are covered, and a heater core is confirmed before it is reached.',
  },
  'coolant-level-dropping': {
    earlier: [parse(coolantLevelDroppingV1)],
    changeNote:
      'Updated by Heatpath: a system worked on lately is bled first; a wet footwell and a milky filler cap are confirmed before a heater core or coolant in the oil is named; the cap is tested for opening too low, too high and at its vacuum valve; pressure tests stay at the cap rating, never above it; the running pressure check stops below the rating; coolant burnt in the cylinders is checked before a head gasket; and distances can be given in miles.',
  },
};
