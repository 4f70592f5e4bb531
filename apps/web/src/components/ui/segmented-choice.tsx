// A small set of mutually exclusive choices (°C or °F) shown side by side. Built on real radio
// inputs inside a fieldset, so the group has a name and arrow keys work.
import { useId } from 'react';

export interface Choice<V extends string> {
  value: V;
  label: string;
}

interface SegmentedChoiceProps<V extends string> {
  legend: string;
  choices: readonly Choice<V>[];
  value: V;
  onChange: (value: V) => void;
  disabled?: boolean;
}

export function SegmentedChoice<V extends string>({
  legend,
  choices,
  value,
  onChange,
  disabled = false,
}: SegmentedChoiceProps<V>) {
  const name = useId();
  return (
    <fieldset className="flex min-w-0 flex-col gap-1.5" disabled={disabled}>
      <legend className="mb-1.5 font-semibold">{legend}</legend>
      <div className="flex rounded-control border-2 border-line-strong bg-surface p-0.5">
        {choices.map((choice) => {
          const checked = choice.value === value;
          return (
            <label
              key={choice.value}
              className={
                'relative flex min-h-touch flex-1 cursor-pointer items-center justify-center ' +
                'rounded-[0.375rem] px-3 font-semibold has-focus-visible:outline-3 ' +
                'has-focus-visible:outline-focus ' +
                (checked ? 'bg-primary text-on-primary' : 'text-ink hover:bg-sunken')
              }
            >
              <input
                type="radio"
                name={name}
                value={choice.value}
                checked={checked}
                onChange={() => onChange(choice.value)}
                // Transparent but covering the whole segment, so a tap (or a test's click)
                // anywhere on it lands on the real radio input.
                className="absolute inset-0 m-0 cursor-pointer opacity-0"
              />
              {checked ? (
                <span aria-hidden="true" className="mr-1.5">
                  ✓
                </span>
              ) : null}
              {choice.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
