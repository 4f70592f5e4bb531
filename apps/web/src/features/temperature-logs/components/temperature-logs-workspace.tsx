// The temperature logs of one case: upload a log (and map its columns when the file does not say
// which is which), pick one of the case's logs, see it over time with its episodes shaded, what
// the analysis found, and use its figures for the case's current measurement step. The case and
// the way answers are sent come from the route, which composes this screen with the case.
import type {
  LogNeedsMapping,
  LogUploadResult,
  TemperatureLogDetail,
  TemperatureLogSummary,
} from '@heatpath/contracts';
import type { WalkEvent } from '@heatpath/fault-tree';
import { useMemo, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useMe } from '../../../lib/auth';
import { useCaseLog } from '../api/get-case-log';
import { useCaseLogs } from '../api/get-case-logs';
import { useChangeLogMapping, useMapPendingUpload } from '../api/map-log-columns';
import {
  formatBytes,
  formatClock,
  formatDuration,
  temperatureDisplay,
  type TemperatureDisplay,
} from '../log-format';
import { ColumnMappingForm } from './column-mapping-form';
import { LogChart, type ChartWindow } from './log-chart';
import { LogResults } from './log-results';
import { LogUploadForm } from './log-upload-form';
import { TemperatureUnitChoice } from './temperature-unit-choice';
import { UseInWalk, type WalkSaveState, type WalkStep } from './use-in-walk';

interface TemperatureLogsWorkspaceProps {
  caseId: string;
  canUpload: boolean;
  canWalk: boolean;
  /** The case's current step; null when the walk has reached a finding. */
  currentStep: (WalkStep & { asksForLog: boolean }) | null;
  save: WalkSaveState;
  onSave: (event: WalkEvent, label: string, note: string) => void;
  onRetrySave: () => void;
  /** Called when a log has been stored on the case (the case's own page shows its files). */
  onLogStored: () => void;
}

const roleWords: Record<string, string> = {
  time: 'Time',
  coolant: 'Coolant',
  intakeAir: 'Intake air',
  ambient: 'Ambient',
  vehicleSpeed: 'Speed',
  engineSpeed: 'Engine speed',
  fanDuty: 'Fan',
};

const sourceWords: Record<TemperatureLogSummary['mappingSource'], string> = {
  detected: 'as the file’s header names them',
  confirmed: 'as chosen for this file',
  remembered: 'as remembered for this kind of file',
};

function mappingLine(log: TemperatureLogDetail): string {
  const parts = Object.entries(roleWords).flatMap(([role, word]) => {
    const index = log.mapping[role as keyof typeof log.mapping];
    return typeof index === 'number' ? [`${word}: column ${index + 1}`] : [];
  });
  return `${parts.join(', ')}; ${log.mapping.temperatureUnit === 'degF' ? '°F' : '°C'}`;
}

export function TemperatureLogsWorkspace(props: TemperatureLogsWorkspaceProps) {
  const { caseId, canUpload, currentStep, onLogStored } = props;
  const list = useCaseLogs(caseId);
  const [pending, setPending] = useState<LogNeedsMapping | null>(null);
  const [chosen, setChosen] = useState<string | null>(null);
  const [uploaded, setUploaded] = useState<string | null>(null);
  const logs = useMemo(() => list.data?.logs ?? [], [list.data]);
  const selectedId = chosen ?? logs.at(-1)?.id ?? null;

  const mapping = useMapPendingUpload({ onStored: onLogStored });

  const onResult = (result: LogUploadResult) => {
    mapping.reset();
    if (result.status === 'needs-mapping') {
      setPending(result);
      setUploaded(null);
    } else {
      setPending(null);
      setChosen(result.log.id);
      setUploaded(result.log.name);
    }
  };

  return (
    <div className="flex flex-col gap-6">
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)] lg:items-start">
        {canUpload ? (
          <section
            aria-labelledby="log-upload-heading"
            className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
          >
            <h2 id="log-upload-heading" className="text-xl font-bold">
              Add a log
            </h2>
            <LogUploadForm
              caseId={caseId}
              step={
                currentStep && currentStep.kind !== 'outcome'
                  ? {
                      nodeId: currentStep.nodeId,
                      title: currentStep.title,
                      asksForLog: currentStep.asksForLog,
                    }
                  : null
              }
              onResult={onResult}
              onStored={onLogStored}
            />
            {uploaded ? (
              <Alert tone="ok" role="status" title="Log stored">
                <p>“{uploaded}” is on the case, with its analysis below.</p>
              </Alert>
            ) : null}
          </section>
        ) : null}
        <LogList
          logs={logs}
          loading={list.isPending}
          error={list.error?.message ?? null}
          onRetry={() => void list.refetch()}
          selectedId={selectedId}
          onSelect={(id) => setChosen(id)}
        />
      </div>

      {pending ? (
        <section
          aria-labelledby="log-mapping-heading"
          className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
        >
          <div className="flex flex-col gap-1">
            <h2 id="log-mapping-heading" className="text-xl font-bold">
              Which column is which in “{pending.name}”?
            </h2>
            <p className="text-ink-muted">
              The file is kept while you choose; your choice is remembered for the next log of this
              kind.
            </p>
          </div>
          <ColumnMappingForm
            key={`${pending.pendingUploadId}:${pending.unsure.join()}`}
            title="Map the log’s columns"
            columns={pending.columns}
            initial={pending.proposed}
            reasons={pending.reasons}
            rememberedProblem={pending.rememberedProblem}
            submitLabel="Read the log with these columns"
            busy={mapping.isPending}
            error={mapping.error?.message ?? null}
            cancelLabel="Not now"
            onCancel={() => setPending(null)}
            onSubmit={(chosenMapping) =>
              mapping.mutate(
                { caseId, pendingUploadId: pending.pendingUploadId, mapping: chosenMapping },
                { onSuccess: onResult },
              )
            }
          />
        </section>
      ) : null}

      {selectedId ? <SelectedLog key={selectedId} {...props} logId={selectedId} /> : null}
    </div>
  );
}

function LogList({
  logs,
  loading,
  error,
  onRetry,
  selectedId,
  onSelect,
}: {
  logs: readonly TemperatureLogSummary[];
  loading: boolean;
  error: string | null;
  onRetry: () => void;
  selectedId: string | null;
  onSelect: (id: string) => void;
}) {
  const me = useMe();
  const display = temperatureDisplay(me.preferences.units);
  return (
    <section
      aria-labelledby="log-list-heading"
      className="flex flex-col gap-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="log-list-heading" className="text-xl font-bold">
        Logs on this case{' '}
        <span className="text-sm font-normal text-ink-muted">({logs.length})</span>
      </h2>
      {loading ? <LoadingState label="Loading the logs…" /> : null}
      {error ? <ErrorState title="Logs not loaded" message={error} onRetry={onRetry} /> : null}
      {!loading && !error && logs.length === 0 ? (
        <p className="text-ink-muted">
          No log yet. Export one from the scan tool after a road test.
        </p>
      ) : null}
      {logs.length > 0 ? (
        <ul className="flex flex-col gap-2">
          {logs.map((log) => {
            const selected = log.id === selectedId;
            return (
              <li key={log.id}>
                <button
                  type="button"
                  aria-pressed={selected}
                  onClick={() => onSelect(log.id)}
                  className={
                    'flex min-h-touch w-full flex-col items-start gap-0.5 rounded-control border-2 px-3 py-2 text-left ' +
                    (selected
                      ? 'border-primary bg-sunken font-semibold'
                      : 'border-line-strong bg-surface hover:bg-sunken')
                  }
                >
                  <span className="flex w-full flex-wrap items-center justify-between gap-2">
                    <span className="break-all">
                      {selected ? <span aria-hidden="true">✓ </span> : null}
                      {log.name}
                    </span>
                    {log.headline.episodes > 0 ? (
                      <Badge tone="danger">
                        {log.headline.episodes} over-temperature{' '}
                        {log.headline.episodes === 1 ? 'episode' : 'episodes'}
                      </Badge>
                    ) : (
                      <Badge>No episode</Badge>
                    )}
                  </span>
                  <span className="text-sm font-normal text-ink-muted">
                    {formatDuration(log.durationSeconds)} · peak{' '}
                    {display.format(log.headline.peakC)} · {log.uploadedBy.name},{' '}
                    {new Date(log.createdAt).toLocaleString('en-GB', {
                      dateStyle: 'medium',
                      timeStyle: 'short',
                    })}
                  </span>
                </button>
              </li>
            );
          })}
        </ul>
      ) : null}
    </section>
  );
}

function ThresholdForm({
  display,
  thresholdC,
  isDefault,
  onChange,
}: {
  display: TemperatureDisplay;
  thresholdC: number;
  isDefault: boolean;
  onChange: (thresholdC: number | undefined) => void;
}) {
  const [text, setText] = useState(String(Math.round(display.fromC(thresholdC))));
  const [problem, setProblem] = useState<string | undefined>(undefined);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const value = Number(text.trim().replace(',', '.'));
    const celsius = Number.isFinite(value) && text.trim() !== '' ? display.toC(value) : Number.NaN;
    if (!(celsius >= 60 && celsius <= 150)) {
      setProblem(`Enter a threshold from ${display.format(60, 0)} to ${display.format(150, 0)}.`);
      return;
    }
    setProblem(undefined);
    onChange(Math.round(celsius * 10) / 10);
  };

  return (
    <form
      noValidate
      onSubmit={submit}
      aria-label="Over-temperature threshold"
      className="flex flex-wrap items-end gap-3"
    >
      <div className="w-64">
        <TextField
          label="Over-temperature threshold"
          inputMode="decimal"
          value={text}
          suffix={display.symbol}
          error={problem}
          onChange={(event) => setText(event.target.value)}
        />
      </div>
      <Button type="submit" variant="secondary">
        Find episodes again
      </Button>
      {!isDefault ? (
        <Button variant="quiet" onClick={() => onChange(undefined)}>
          Back to Heatpath’s {display.format(110, 0)}
        </Button>
      ) : null}
    </form>
  );
}

function SelectedLog({
  caseId,
  logId,
  canUpload,
  canWalk,
  currentStep,
  save,
  onSave,
  onRetrySave,
}: TemperatureLogsWorkspaceProps & { logId: string }) {
  const me = useMe();
  const preferences = me.preferences.units;
  const display = useMemo(() => temperatureDisplay(preferences), [preferences]);
  const [threshold, setThreshold] = useState<number | undefined>(undefined);
  const [zoom, setZoom] = useState<ChartWindow | null>(null);
  const [remapping, setRemapping] = useState(false);
  const query = useCaseLog(caseId, logId, { threshold, from: zoom?.from, to: zoom?.to });
  const change = useChangeLogMapping();

  if (query.isPending) return <LoadingState label="Loading the log…" />;
  if (query.isError) {
    return (
      <ErrorState
        title="Log not loaded"
        message={query.error.message}
        onRetry={() => void query.refetch()}
        retrying={query.isRefetching}
      />
    );
  }
  const log = query.data;
  const { readings, durationSeconds, detected } = log;

  return (
    <section aria-labelledby="selected-log-heading" className="flex flex-col gap-6">
      <div className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
        <div className="flex flex-col gap-3 lg:flex-row lg:items-start lg:justify-between">
          <div className="flex min-w-0 flex-col gap-1">
            <h2 id="selected-log-heading" className="text-xl font-bold break-all">
              {log.name}
            </h2>
            <p className="text-ink-muted">
              {readings.toLocaleString('en-GB')} readings over {formatDuration(durationSeconds)}
              {log.startedAt ? `, from ${log.startedAt}` : ''} · {formatBytes(log.byteSize)} ·{' '}
              <a className="underline underline-offset-4" href={log.fileUrl}>
                Download the original
              </a>
            </p>
            <p className="text-sm text-ink-muted">
              Columns {sourceWords[log.mappingSource]}: {mappingLine(log)}
              {detected.header ? '' : ' (the file has no header)'}.
              {log.skippedRows > 0
                ? ` ${log.skippedRows.toLocaleString('en-GB')} lines without a coolant reading were skipped.`
                : ''}
            </p>
            {canUpload && log.columns && !remapping ? (
              <div>
                <Button variant="quiet" className="-ml-4" onClick={() => setRemapping(true)}>
                  Change the columns
                </Button>
              </div>
            ) : null}
          </div>
          <div className="shrink-0 lg:w-56">
            <TemperatureUnitChoice />
          </div>
        </div>

        {remapping && log.columns ? (
          <div className="flex flex-col gap-3 border-t-2 border-line pt-4">
            <h3 className="text-lg font-bold">Read “{log.name}” with other columns</h3>
            <ColumnMappingForm
              title="Change the log’s columns"
              columns={log.columns}
              initial={log.mapping}
              reasons={[]}
              submitLabel="Read it again"
              busy={change.isPending}
              error={change.error?.message ?? null}
              cancelLabel="Keep these columns"
              onCancel={() => setRemapping(false)}
              onSubmit={(mapping) =>
                change.mutate(
                  { caseId, logId, mapping },
                  {
                    onSuccess: () => {
                      setRemapping(false);
                      setZoom(null);
                    },
                  },
                )
              }
            />
          </div>
        ) : null}

        <ThresholdForm
          // Starts again from the threshold in use when it or the unit changes.
          key={`${log.analysis.overTemperature.thresholdC}:${display.unit}`}
          display={display}
          thresholdC={log.analysis.overTemperature.thresholdC}
          isDefault={threshold === undefined}
          onChange={setThreshold}
        />
        <LogChart
          log={log}
          display={display}
          zoom={zoom}
          onZoom={setZoom}
          updating={query.isPlaceholderData || query.isFetching}
        />
        <p className="text-sm text-ink-muted">
          Times are from the first reading ({formatClock(0)}). Shaded: at or over the threshold for{' '}
          {formatDuration(log.analysis.overTemperature.minEpisodeSeconds)} or longer.
        </p>
      </div>

      <UseInWalk
        logName={log.name}
        candidates={log.candidateReadings}
        step={currentStep}
        canWalk={canWalk}
        preferences={preferences}
        save={save}
        onSave={onSave}
        onRetry={onRetrySave}
      />
      <LogResults log={log} display={display} />
    </section>
  );
}
