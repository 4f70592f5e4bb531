// The short form for a log whose columns the file does not name clearly: which column is the time
// and which the coolant temperature (and, if the log has them, the other channels), and whether
// temperatures are in °C or °F when the header does not say. The file's first readings are shown
// so the columns can be recognised. Heatpath's proposal is filled in; the person confirms it.
import {
  columnMappingSchema,
  type CandidateColumn,
  type ColumnMapping,
  type ColumnRole,
} from '@heatpath/contracts';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';

const roleLabels: Record<ColumnRole, string> = {
  time: 'Time',
  coolant: 'Coolant temperature',
  intakeAir: 'Intake or charge-air temperature',
  ambient: 'Ambient temperature',
  vehicleSpeed: 'Vehicle speed',
  engineSpeed: 'Engine speed',
  fanDuty: 'Fan duty or command',
};
const optionalRoles = ['intakeAir', 'ambient', 'vehicleSpeed', 'engineSpeed', 'fanDuty'] as const;
type OptionalRole = (typeof optionalRoles)[number];

type TimeUnit = NonNullable<ColumnMapping['timeUnit']>;
type TemperatureUnit = NonNullable<ColumnMapping['temperatureUnit']>;

interface ColumnMappingFormProps {
  /** Names the form for assistive technology and the tests. */
  title: string;
  columns: readonly CandidateColumn[];
  /** What to start from: Heatpath's proposal, or the mapping the log was read with. */
  initial: Partial<ColumnMapping>;
  reasons: readonly string[];
  /** Why the workshop's remembered mapping was not used, when it no longer fits. */
  rememberedProblem?: string | null;
  submitLabel: string;
  busy: boolean;
  /** The API's refusal of the last mapping, with the line it names. */
  error: string | null;
  onSubmit: (mapping: ColumnMapping) => void;
  onCancel: () => void;
  cancelLabel: string;
}

function columnLabel(column: CandidateColumn): string {
  const samples = column.samples
    .filter((s) => s !== '')
    .slice(0, 3)
    .join(', ');
  const header = column.header ? ` “${column.header}”` : '';
  return `Column ${column.index + 1}${header}${samples ? ` — ${samples}…` : ''}`;
}

const asText = (index: number | null | undefined) =>
  index === null || index === undefined ? '' : String(index);
const asIndex = (text: string) => (text === '' ? null : Number(text));

export function ColumnMappingForm({
  title,
  columns,
  initial,
  reasons,
  rememberedProblem = null,
  submitLabel,
  busy,
  error,
  onSubmit,
  onCancel,
  cancelLabel,
}: ColumnMappingFormProps) {
  const [time, setTime] = useState(asText(initial.time));
  const [coolant, setCoolant] = useState(asText(initial.coolant));
  const [optional, setOptional] = useState<Record<OptionalRole, string>>(
    () =>
      Object.fromEntries(optionalRoles.map((role) => [role, asText(initial[role])])) as Record<
        OptionalRole,
        string
      >,
  );
  const [unit, setUnit] = useState<TemperatureUnit | ''>(initial.temperatureUnit ?? '');
  const [timeUnit, setTimeUnit] = useState<TimeUnit>(initial.timeUnit ?? 'seconds');
  const [speedUnit, setSpeedUnit] = useState<'km/h' | 'mph'>(initial.vehicleSpeedUnit ?? 'km/h');
  const [problems, setProblems] = useState<Record<string, string>>({});

  const options = columns.map((column) => ({
    value: String(column.index),
    label: columnLabel(column),
  }));
  const choose = [{ value: '', label: 'Choose a column' }, ...options];
  const notInFile = [{ value: '', label: 'Not in this file' }, ...options];
  const timeColumn = columns.find((column) => String(column.index) === time);
  // Plain numbers need their unit; clock times and timestamps say it themselves.
  const plainTime = timeColumn !== undefined && timeColumn.looksLike === 'number';

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Record<string, string> = {};
    if (time === '') found.time = 'Choose the column that holds the time.';
    if (coolant === '') found.coolant = 'Choose the column that holds the coolant temperature.';
    if (unit === '') found.unit = 'Say whether the temperatures are in °C or °F.';
    const used = new Map<string, ColumnRole>();
    for (const [role, value] of [
      ['time', time],
      ['coolant', coolant],
      ...optionalRoles.map((r) => [r, optional[r]] as const),
    ] as const) {
      if (value === '') continue;
      const other = used.get(value);
      if (other)
        found[role] = `That column is already chosen as ${roleLabels[other].toLowerCase()}.`;
      else used.set(value, role);
    }
    setProblems(found);
    if (Object.keys(found).length > 0) return;
    const parsed = columnMappingSchema.safeParse({
      time: asIndex(time),
      coolant: asIndex(coolant),
      ...Object.fromEntries(optionalRoles.map((role) => [role, asIndex(optional[role])])),
      temperatureUnit: unit,
      ...(plainTime ? { timeUnit } : {}),
      ...(optional.vehicleSpeed !== '' ? { vehicleSpeedUnit: speedUnit } : {}),
    });
    if (parsed.success) onSubmit(parsed.data);
  };

  return (
    <form noValidate aria-label={title} onSubmit={submit} className="flex flex-col gap-5">
      {rememberedProblem ? (
        <Alert tone="caution" title="The remembered columns do not fit">
          <p>{rememberedProblem}</p>
        </Alert>
      ) : null}
      {reasons.length > 0 ? (
        <Alert tone="info" title="Which column is which?">
          <ul className="list-disc pl-5">
            {reasons.map((reason) => (
              <li key={reason}>{reason}</li>
            ))}
          </ul>
        </Alert>
      ) : null}

      <div className="overflow-x-auto rounded-control border-2 border-line">
        <table className="w-full border-collapse">
          <caption className="px-3 py-2 text-left font-semibold">The file’s first readings</caption>
          <thead>
            <tr>
              {columns.map((column) => (
                <th
                  key={column.index}
                  scope="col"
                  className="bg-sunken px-3 py-2 text-left align-bottom"
                >
                  <span className="block">Column {column.index + 1}</span>
                  <span className="block font-normal text-ink-muted">
                    {column.header ?? 'no header'}
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {Array.from(
              { length: Math.max(0, ...columns.map((c) => c.samples.length)) },
              (_, row) => (
                <tr key={row} className="border-t border-line">
                  {columns.map((column) => (
                    <td key={column.index} className="px-3 py-1.5 tabular-nums whitespace-nowrap">
                      {column.samples[row] ?? ''}
                    </td>
                  ))}
                </tr>
              ),
            )}
          </tbody>
        </table>
      </div>

      <div className="grid gap-5 md:grid-cols-2">
        <SelectField
          label="Time"
          options={choose}
          value={time}
          error={problems.time}
          onChange={(event) => setTime(event.target.value)}
        />
        <SelectField
          label="Coolant temperature"
          options={choose}
          value={coolant}
          error={problems.coolant}
          onChange={(event) => setCoolant(event.target.value)}
        />
      </div>
      <div className="flex flex-col gap-1.5">
        <SegmentedChoice
          legend="Temperatures in the file are in"
          choices={[
            { value: 'degC', label: '°C' },
            { value: 'degF', label: '°F' },
          ]}
          value={unit}
          onChange={(value) => setUnit(value)}
        />
        {problems.unit ? (
          <p role="alert" className="font-semibold text-danger-ink">
            <span aria-hidden="true">✕ </span>
            {problems.unit}
          </p>
        ) : null}
      </div>
      {plainTime ? (
        <SegmentedChoice
          legend="The time column counts in"
          choices={[
            { value: 'seconds', label: 'seconds' },
            { value: 'milliseconds', label: 'ms' },
            { value: 'minutes', label: 'minutes' },
          ]}
          value={timeUnit}
          onChange={setTimeUnit}
        />
      ) : null}

      <fieldset className="flex flex-col gap-4">
        <legend className="mb-1 font-semibold">Other channels, if the log has them</legend>
        <div className="grid gap-5 md:grid-cols-2">
          {optionalRoles.map((role) => (
            <SelectField
              key={role}
              label={roleLabels[role]}
              options={notInFile}
              value={optional[role]}
              error={problems[role]}
              onChange={(event) =>
                setOptional((before) => ({ ...before, [role]: event.target.value }))
              }
            />
          ))}
        </div>
        {optional.vehicleSpeed !== '' ? (
          <SegmentedChoice
            legend="Vehicle speed is in"
            choices={[
              { value: 'km/h', label: 'km/h' },
              { value: 'mph', label: 'mph' },
            ]}
            value={speedUnit}
            onChange={setSpeedUnit}
          />
        ) : null}
      </fieldset>

      {error ? (
        <Alert tone="danger" role="alert" title="The log could not be read with these columns">
          <p>{error}</p>
        </Alert>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="large" busy={busy} busyLabel="Reading the log…">
          {submitLabel}
        </Button>
        <Button variant="secondary" size="large" onClick={onCancel} disabled={busy}>
          {cancelLabel}
        </Button>
      </div>
    </form>
  );
}
