// The signed-in person's units for the calculators, and a way to change one that is remembered
// for their next visit on any device.
import type { UnitPreferences } from '@heatpath/contracts';
import { useMe } from '../../../lib/auth';
import { useUpdateUnitPreferences } from '../../../lib/unit-preferences';
import { displayUnits, type DisplayUnits } from '../units';

export interface UnitsState {
  preferences: UnitPreferences;
  units: DisplayUnits;
  setPreference: <K extends keyof UnitPreferences>(key: K, value: UnitPreferences[K]) => void;
  saveError: string | null;
}

export function useUnits(): UnitsState {
  const me = useMe();
  const update = useUpdateUnitPreferences();
  const preferences = me.preferences.units;
  return {
    preferences,
    units: displayUnits(preferences),
    setPreference: (key, value) => {
      const units: Partial<UnitPreferences> = {};
      units[key] = value;
      update.mutate({ units });
    },
    saveError: update.error ? update.error.message : null,
  };
}
