// The unit switches a calculator needs. A change shows at once and is remembered for the person
// (PATCH /api/me/preferences); if saving fails the switch goes back and says why.
import type { UnitPreferences } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { useUnits } from '../hooks/use-units';

type UnitKind = keyof UnitPreferences;

const toggles: {
  [K in UnitKind]: { legend: string; choices: { value: UnitPreferences[K]; label: string }[] };
} = {
  temperature: {
    legend: 'Temperature unit',
    choices: [
      { value: 'C', label: '°C' },
      { value: 'F', label: '°F' },
    ],
  },
  pressure: {
    legend: 'Pressure unit',
    choices: [
      { value: 'bar', label: 'bar' },
      { value: 'psi', label: 'psi' },
    ],
  },
  volume: {
    legend: 'Volume unit',
    choices: [
      { value: 'L', label: 'litres' },
      { value: 'qt', label: 'US qt' },
    ],
  },
};

export function UnitToggles({ kinds }: { kinds: readonly UnitKind[] }) {
  const { preferences, setPreference, saveError } = useUnits();
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap gap-x-6 gap-y-3 [&>*]:min-w-40 [&>*]:flex-1 sm:[&>*]:flex-none">
        {kinds.includes('temperature') ? (
          <SegmentedChoice
            legend={toggles.temperature.legend}
            choices={toggles.temperature.choices}
            value={preferences.temperature}
            onChange={(value) => setPreference('temperature', value)}
          />
        ) : null}
        {kinds.includes('pressure') ? (
          <SegmentedChoice
            legend={toggles.pressure.legend}
            choices={toggles.pressure.choices}
            value={preferences.pressure}
            onChange={(value) => setPreference('pressure', value)}
          />
        ) : null}
        {kinds.includes('volume') ? (
          <SegmentedChoice
            legend={toggles.volume.legend}
            choices={toggles.volume.choices}
            value={preferences.volume}
            onChange={(value) => setPreference('volume', value)}
          />
        ) : null}
      </div>
      {saveError ? (
        <Alert tone="danger" role="alert" title="Unit choice not saved">
          <p>{saveError}</p>
        </Alert>
      ) : null}
    </div>
  );
}
