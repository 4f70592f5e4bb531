// The °C/°F switch of the logs screen. It is the person's one temperature preference, the same
// the calculators and the case page use: a change shows at once and is remembered.
import { Alert } from '../../../components/ui/alert';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { useMe } from '../../../lib/auth';
import { useUpdateUnitPreferences } from '../../../lib/unit-preferences';

export function TemperatureUnitChoice() {
  const me = useMe();
  const update = useUpdateUnitPreferences();
  return (
    <div className="flex flex-col gap-2">
      <SegmentedChoice
        legend="Temperature unit"
        choices={[
          { value: 'C', label: '°C' },
          { value: 'F', label: '°F' },
        ]}
        value={me.preferences.units.temperature}
        onChange={(temperature) => update.mutate({ units: { temperature } })}
      />
      {update.error ? (
        <Alert tone="danger" role="alert" title="Unit choice not saved">
          <p>{update.error.message}</p>
        </Alert>
      ) : null}
    </div>
  );
}
