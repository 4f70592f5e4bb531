// Input boxes for the calculators: numbers with their unit beside them, and the glycol question.
import type { Glycol } from '@heatpath/coolant';
import type { ReactNode } from 'react';
import { FieldError, TextField } from '../../../components/ui/field';
import { Alert } from '../../../components/ui/alert';

interface NumberFieldProps {
  label: string;
  value: string;
  onChange: (value: string) => void;
  /** Unit symbol shown beside the box ("°C", "%"). */
  unit: string;
  hint?: ReactNode;
  error?: string | undefined;
  /** Offer a sign switch: phone number pads often have no minus key. */
  signed?: boolean;
}

export function NumberField({
  label,
  value,
  onChange,
  unit,
  hint,
  error,
  signed = false,
}: NumberFieldProps) {
  const flipSign = () => {
    const text = value.trim();
    onChange(text.startsWith('-') || text.startsWith('−') ? text.slice(1) : `-${text}`);
  };
  return (
    <TextField
      label={label}
      hint={hint}
      error={error}
      suffix={unit}
      value={value}
      onChange={(event) => onChange(event.target.value)}
      inputMode={signed ? 'text' : 'decimal'}
      autoComplete="off"
      spellCheck={false}
      enterKeyHint="next"
      after={
        signed ? (
          <button
            type="button"
            onClick={flipSign}
            className="min-h-touch min-w-touch shrink-0 rounded-control border-2 border-line-strong bg-surface px-3 text-lg font-bold hover:bg-sunken"
          >
            {'± '}
            <span className="sr-only">Change the sign of {label}</span>
          </button>
        ) : null
      }
    />
  );
}

export type GlycolAnswer = Glycol | 'unknown' | '';

/** The glycol to compute with, or null while it is unanswered or not known. */
export function knownGlycol(answer: GlycolAnswer): Glycol | null {
  return answer === 'ethylene' || answer === 'propylene' ? answer : null;
}

const glycolChoices: { value: Exclude<GlycolAnswer, ''>; label: string; detail: string }[] = [
  { value: 'ethylene', label: 'Ethylene glycol (EG)', detail: 'Most car coolants' },
  { value: 'propylene', label: 'Propylene glycol (PG)', detail: 'Sold as less toxic' },
  { value: 'unknown', label: 'Not known or mixed', detail: 'Topped up with something else' },
];

interface GlycolFieldProps {
  value: GlycolAnswer;
  onChange: (value: GlycolAnswer) => void;
  error?: string | undefined;
  /** Why the answer matters for this calculator. */
  hint: string;
}

export function GlycolField({ value, onChange, error, hint }: GlycolFieldProps) {
  return (
    <fieldset
      className="flex flex-col gap-2"
      aria-describedby={error ? 'glycol-error' : 'glycol-hint'}
    >
      <legend className="mb-1 font-semibold">Glycol in the system</legend>
      <p id="glycol-hint" className="text-sm text-ink-muted">
        {hint}
      </p>
      <div className="grid gap-2">
        {glycolChoices.map((choice) => (
          <label
            key={choice.value}
            className={
              'flex min-h-touch cursor-pointer items-center gap-3 rounded-control border-2 px-3 py-2 ' +
              'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
              (value === choice.value
                ? 'border-primary bg-sunken font-semibold'
                : 'border-line-strong bg-surface')
            }
          >
            <input
              type="radio"
              name="glycol"
              value={choice.value}
              checked={value === choice.value}
              onChange={() => onChange(choice.value)}
              className="size-5 accent-primary"
            />
            <span className="flex flex-col">
              <span>{choice.label}</span>
              <span className="text-sm font-normal text-ink-muted">{choice.detail}</span>
            </span>
          </label>
        ))}
      </div>
      {error ? <FieldError id="glycol-error" message={error} /> : null}
    </fieldset>
  );
}

/** Shown instead of a figure when the glycol is not known: the reading cannot be trusted. */
export function UnknownGlycolWarning() {
  return (
    <Alert tone="caution" title="No figure without the glycol">
      <p>
        Each glycol has its own freezing curve and its own refractometer scale. With an unknown or
        mixed glycol a reading can be off by 10 K or more (ASTM D3321), so Heatpath gives no figure.
      </p>
      <p>
        Find out what is in the system (service records, the tank label or a test strip), or drain,
        flush and refill with one known coolant.
      </p>
    </Alert>
  );
}
