// The question a learner answers before a step is revealed: its options as large tiles (real
// radio inputs), then one button to lock the choice in. Two taps rather than one, so a slip of a
// gloved thumb does not cost a point.
import type { PredictionAsk } from '@heatpath/contracts';
import { useId, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldError } from '../../../components/ui/field';

interface PredictionFormProps {
  ask: PredictionAsk;
  busy: boolean;
  /** The API's sentence when the prediction was not taken. */
  error?: string | null;
  onPredict: (optionId: string) => void;
}

export function PredictionForm({ ask, busy, error, onPredict }: PredictionFormProps) {
  const [chosen, setChosen] = useState<string | null>(null);
  const [missing, setMissing] = useState(false);
  const name = useId();
  const legendId = useId();
  const errorId = useId();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!chosen) {
      setMissing(true);
      return;
    }
    onPredict(chosen);
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby={legendId}
      className="flex flex-col gap-4 rounded-panel border-2 border-l-8 border-primary bg-sunken p-4 sm:p-6"
    >
      <fieldset
        className="flex flex-col gap-3"
        aria-describedby={missing ? errorId : undefined}
        disabled={busy}
      >
        <legend id={legendId} className="mb-1 text-xl font-bold">
          <span className="block text-sm font-semibold text-ink-muted">
            Your prediction · up to {ask.maxPoints} {ask.maxPoints === 1 ? 'point' : 'points'}
          </span>
          {ask.question}
        </legend>
        <div className="grid gap-3 lg:grid-cols-2">
          {ask.options.map((option) => {
            const checked = option.id === chosen;
            return (
              <label
                key={option.id}
                className={
                  'relative flex min-h-touch-lg cursor-pointer items-center gap-3 rounded-control ' +
                  'border-2 px-4 py-3 text-lg font-semibold has-focus-visible:outline-3 ' +
                  'has-focus-visible:outline-focus ' +
                  (checked
                    ? 'border-primary bg-primary text-on-primary'
                    : 'border-line-strong bg-surface text-ink hover:bg-canvas')
                }
              >
                <input
                  type="radio"
                  name={name}
                  value={option.id}
                  checked={checked}
                  onChange={() => {
                    setChosen(option.id);
                    setMissing(false);
                  }}
                  className="absolute inset-0 m-0 cursor-pointer opacity-0"
                />
                <span
                  aria-hidden="true"
                  className="flex size-7 shrink-0 items-center justify-center rounded-full border-2 border-current text-base"
                >
                  {checked ? '✓' : ''}
                </span>
                <span className="min-w-0 [overflow-wrap:anywhere]">{option.label}</span>
              </label>
            );
          })}
        </div>
      </fieldset>
      {missing ? <FieldError id={errorId} message="Choose one of the options first." /> : null}
      {error ? (
        <Alert tone="danger" role="alert" title="Prediction not taken">
          <p>{error}</p>
        </Alert>
      ) : null}
      <div>
        <Button
          type="submit"
          size="large"
          busy={busy}
          busyLabel="Checking…"
          className="w-full sm:w-auto"
        >
          See what happened
        </Button>
      </div>
    </form>
  );
}
