// "Use in the walk": the case's current measurement step with the log's candidate readings
// beside the boxes they fit. A value from the log goes into a box only when the technician taps
// it, shows where it came from and how it was found, and is sent only after they tick that they
// checked it against the chart and press save; the other boxes are typed as on the case page.
// The answer itself is sent by whoever renders this (the route passes the case's answer sender),
// with a note recording which values came from which log.
import type { CandidateReading, UnitPreferences } from '@heatpath/contracts';
import {
  formatNumber,
  formatWithUnit,
  fromCanonical,
  toCanonical,
  unitSymbol,
  type MeasurementInput,
  type NodeKind,
  type Quantity,
  type Reading,
  type UnitCode,
  type WalkEvent,
} from '@heatpath/fault-tree';
import { useId, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { allowedRange } from '../../../components/walk-step/measurement-form';
import { readNumber } from '../../../lib/read-number';
import { preferredUnit } from '../../../lib/reading-units';

export interface WalkStep {
  nodeId: string;
  title: string;
  kind: NodeKind;
  position: number;
  /** The boxes of a measurement step; empty for other kinds. */
  inputs: readonly MeasurementInput[];
}

export interface WalkSaveState {
  status: 'idle' | 'sending' | 'not-saved' | 'refused' | 'moved-on';
  message: string | null;
  fields: Readonly<Record<string, string>>;
}

interface UseInWalkProps {
  logName: string;
  candidates: readonly CandidateReading[];
  step: WalkStep | null;
  canWalk: boolean;
  preferences: UnitPreferences;
  save: WalkSaveState;
  onSave: (event: WalkEvent, label: string, note: string) => void;
  onRetry: () => void;
}

/** Candidates that can fill a box: the ones named for it first, then any of the same quantity. */
export function fittingCandidates(
  input: MeasurementInput,
  candidates: readonly CandidateReading[],
): { candidate: CandidateReading; suggested: boolean }[] {
  return candidates
    .filter((c) => c.quantity === input.quantity)
    .map((candidate) => ({ candidate, suggested: candidate.matchesInputs.includes(input.name) }))
    .sort((a, b) => Number(b.suggested) - Number(a.suggested));
}

function shown(value: number, unit: UnitCode, quantity: Quantity): string {
  return formatNumber(fromCanonical(value, unit, quantity), 1);
}

export function UseInWalk(props: UseInWalkProps) {
  const { step, canWalk } = props;
  const headingId = useId();
  let body;
  if (!canWalk) {
    body = (
      <p className="rounded-control bg-sunken p-3">
        Read only: a technician or the workshop lead answers the case’s steps.
      </p>
    );
  } else if (!step || step.kind === 'outcome') {
    body = (
      <p className="text-ink-muted">
        The walk has reached a finding: no step is waiting for readings.
      </p>
    );
  } else if (step.kind !== 'measurement' || step.inputs.length === 0) {
    body = (
      <p className="text-ink-muted">
        The case stands at “{step.title}”, which takes no readings. When the walk reaches a
        measurement step, the log’s figures can be offered for it here.
      </p>
    );
  } else if (!step.inputs.some((input) => fittingCandidates(input, props.candidates).length > 0)) {
    body = (
      <p className="text-ink-muted">
        None of this log’s figures fits the readings “{step.title}” asks for. Enter them on the case
        page.
      </p>
    );
  } else {
    body = (
      <StepReadingsForm
        // A new step, or other units, start afresh.
        key={`${step.nodeId}:${step.position}:${Object.values(props.preferences).join(':')}`}
        {...props}
        step={step}
      />
    );
  }
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-col gap-1">
        <h2 id={headingId} className="text-xl font-bold">
          Use in the walk
        </h2>
        <p className="text-ink-muted">
          Figures from the log are estimates: each is used only after you check it and confirm.
        </p>
      </div>
      {body}
    </section>
  );
}

interface BoxState {
  text: string;
  /** The candidate the value was taken from; null once typed or changed by hand. */
  from: CandidateReading | null;
}

function StepReadingsForm({
  logName,
  candidates,
  step,
  preferences,
  save,
  onSave,
  onRetry,
}: UseInWalkProps & { step: WalkStep }) {
  const formId = useId();
  const [boxes, setBoxes] = useState<Record<string, BoxState>>(() =>
    Object.fromEntries(step.inputs.map((input) => [input.name, { text: '', from: null }])),
  );
  const [checked, setChecked] = useState(false);
  const [problems, setProblems] = useState<Record<string, string>>({});
  const [confirmProblem, setConfirmProblem] = useState<string | null>(null);
  const busy = save.status === 'sending';
  const fromLog = step.inputs.filter((input) => boxes[input.name]?.from);

  const setBox = (name: string, box: BoxState) => {
    setBoxes((before) => ({ ...before, [name]: box }));
    setProblems(({ [name]: _gone, ...rest }) => rest);
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found: Record<string, string> = {};
    const readings: Record<string, Reading> = {};
    for (const input of step.inputs) {
      const unit = preferredUnit(input.quantity, preferences);
      const value = readNumber(boxes[input.name]?.text ?? '');
      if (value === null) {
        found[input.name] = `Enter “${input.label}”.`;
      } else if (Number.isNaN(value)) {
        found[input.name] = 'Enter a number, such as 92.5.';
      } else {
        const canonical = toCanonical(value, unit, input.quantity);
        if (canonical < input.range.min || canonical > input.range.max) {
          found[input.name] = `${allowedRange(input, unit)}.`;
        }
        readings[input.name] = { value, unit };
      }
    }
    setProblems(found);
    const needsConfirm = fromLog.length > 0 && !checked;
    setConfirmProblem(needsConfirm ? 'Tick that you checked the values from the log first.' : null);
    if (Object.keys(found).length > 0 || needsConfirm) return;
    const words = (input: MeasurementInput) => {
      const r = readings[input.name];
      return r ? `${input.label} ${formatWithUnit(r.value, r.unit)}` : input.label;
    };
    const label = `Readings: ${step.inputs.map(words).join(', ')}`;
    const note =
      fromLog.length > 0
        ? `From the temperature log “${logName}”, checked against its chart and confirmed: ` +
          fromLog
            .map((input) => `${words(input)} (${boxes[input.name]?.from?.label ?? 'from the log'})`)
            .join('; ') +
          '.'
        : '';
    onSave(
      { type: 'answer.measurement', nodeId: step.nodeId, position: step.position, readings },
      label,
      note,
    );
  };

  return (
    <form
      noValidate
      aria-label={`Readings for ${step.title}`}
      onSubmit={submit}
      className="flex flex-col gap-5"
    >
      <p>
        The case stands at <span className="font-semibold">“{step.title}”</span>.
      </p>
      {step.inputs.map((input) => {
        const unit = preferredUnit(input.quantity, preferences);
        const box = boxes[input.name] ?? { text: '', from: null };
        const fitting = fittingCandidates(input, candidates);
        const refused = save.status === 'refused' ? save.fields[input.name] : undefined;
        return (
          <div key={input.name} className="flex flex-col gap-2">
            <div className="grid gap-3 md:grid-cols-2 md:items-start">
              <TextField
                label={input.label}
                labelAside={allowedRange(input, unit)}
                value={box.text}
                disabled={busy}
                inputMode={input.range.min < 0 ? 'text' : 'decimal'}
                autoComplete="off"
                error={problems[input.name] ?? refused}
                suffix={unitSymbol(unit) || undefined}
                onChange={(event) => setBox(input.name, { text: event.target.value, from: null })}
              />
              {fitting.length > 0 ? (
                <SelectField
                  label={
                    <>
                      From the log<span className="sr-only"> for {input.label}</span>
                    </>
                  }
                  className="font-semibold"
                  disabled={busy}
                  value={box.from?.name ?? ''}
                  options={[
                    {
                      value: '',
                      label: `Choose from ${fitting.length} ${fitting.length === 1 ? 'figure' : 'figures'}`,
                    },
                    ...fitting.map(({ candidate, suggested }) => ({
                      value: candidate.name,
                      label: `${shown(candidate.value, unit, input.quantity)} ${unitSymbol(unit)} · ${candidate.label}${suggested ? ' (asked here)' : ''}`,
                    })),
                  ]}
                  onChange={(event) => {
                    const picked = fitting.find((f) => f.candidate.name === event.target.value);
                    setBox(
                      input.name,
                      picked
                        ? {
                            text: shown(picked.candidate.value, unit, input.quantity),
                            from: picked.candidate,
                          }
                        : { text: '', from: null },
                    );
                    setChecked(false);
                  }}
                />
              ) : (
                <p className="text-sm text-ink-muted md:pt-9">Not in the log: type it.</p>
              )}
            </div>
            {box.from ? (
              <div className="rounded-control border-l-8 border-info-line bg-info-bg p-3 text-sm text-info-ink">
                <p>
                  <span className="font-semibold">From the log: </span>
                  {box.from.label}. {box.from.basis.method}
                </p>
                <p>{box.from.basis.status}</p>
              </div>
            ) : null}
          </div>
        );
      })}

      {fromLog.length > 0 ? (
        <div className="flex flex-col gap-1.5">
          <label className="flex min-h-touch items-center gap-3 font-semibold">
            <input
              type="checkbox"
              checked={checked}
              disabled={busy}
              aria-describedby={confirmProblem ? `${formId}-confirm` : undefined}
              onChange={(event) => {
                setChecked(event.target.checked);
                setConfirmProblem(null);
              }}
              className="size-6 shrink-0 accent-primary"
            />
            I have checked the values from the log against the chart
          </label>
          {confirmProblem ? (
            <p id={`${formId}-confirm`} className="font-semibold text-danger-ink">
              <span aria-hidden="true">✕ </span>
              {confirmProblem}
            </p>
          ) : null}
        </div>
      ) : null}

      {save.status === 'not-saved' && save.message ? (
        <Alert tone="caution" role="alert" title="Not saved yet">
          <p>{save.message}</p>
          <div>
            <Button variant="secondary" onClick={onRetry}>
              Try again
            </Button>
          </div>
        </Alert>
      ) : null}
      {(save.status === 'refused' || save.status === 'moved-on') && save.message ? (
        <Alert tone="danger" role="alert" title="Not saved">
          <p>{save.message}</p>
        </Alert>
      ) : null}

      <div>
        <Button type="submit" size="large" busy={busy} busyLabel="Saving…">
          Confirm and save to the step
        </Button>
      </div>
    </form>
  );
}
