// Labelled form fields. The label sits above the control (never a placeholder standing in for it),
// the hint and the error are tied to the control with aria-describedby, and an error is marked
// with a word and an icon as well as colour.
import {
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

const controlClasses =
  'block w-full min-h-touch rounded-control border-2 border-line-strong bg-surface px-3 ' +
  'text-base text-ink aria-invalid:border-danger-line aria-invalid:border-[3px] ' +
  'disabled:bg-sunken disabled:text-ink-muted';

interface FieldFrameProps {
  id: string;
  label: ReactNode;
  /** A short fact on the label's line, such as the allowed range; read as a description. */
  labelAside?: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  children: ReactNode;
}

function FieldFrame({ id, label, labelAside, hint, error, children }: FieldFrameProps) {
  return (
    <div className="flex flex-col gap-1.5">
      {labelAside ? (
        <div className="flex flex-wrap items-baseline justify-between gap-x-3">
          <label htmlFor={id} className="font-semibold">
            {label}
          </label>
          <span id={`${id}-aside`} className="text-sm text-ink-muted">
            {labelAside}
          </span>
        </div>
      ) : (
        <label htmlFor={id} className="font-semibold">
          {label}
        </label>
      )}
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {children}
      {error ? <FieldError id={`${id}-error`} message={error} /> : null}
    </div>
  );
}

export function FieldError({ id, message }: { id: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-2 font-semibold text-danger-ink">
      <span aria-hidden="true" className="mt-0.5 inline-block font-bold">
        ✕
      </span>
      <span>
        <span className="sr-only">Error: </span>
        {message}
      </span>
    </p>
  );
}

function describedBy(
  id: string,
  hint: ReactNode,
  error: string | undefined,
  aside?: ReactNode,
): string | undefined {
  const ids = [aside ? `${id}-aside` : '', hint ? `${id}-hint` : '', error ? `${id}-error` : ''];
  const present = ids.filter(Boolean);
  return present.length > 0 ? present.join(' ') : undefined;
}

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: ReactNode;
  labelAside?: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  /** Text shown after the box, such as a unit ("°C"). */
  suffix?: ReactNode;
  /** A control on the box's row, after the unit (a sign switch, say). */
  after?: ReactNode;
  id?: string;
}

export function TextField({
  label,
  labelAside,
  hint,
  error,
  suffix,
  after,
  id: givenId,
  className = '',
  ...rest
}: TextFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  const input = (
    <input
      id={id}
      className={`${controlClasses} ${className}`}
      aria-invalid={error ? true : undefined}
      aria-describedby={describedBy(id, hint, error, labelAside)}
      {...rest}
    />
  );
  return (
    <FieldFrame id={id} label={label} labelAside={labelAside} hint={hint} error={error}>
      {suffix || after ? (
        <div className="flex items-stretch gap-2">
          {input}
          {suffix ? (
            <span className="flex min-w-14 shrink-0 items-center justify-center rounded-control bg-sunken px-3 font-semibold whitespace-nowrap">
              {suffix}
            </span>
          ) : null}
          {after}
        </div>
      ) : (
        input
      )}
    </FieldFrame>
  );
}

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  options: readonly SelectOption[];
  id?: string;
}

export function SelectField({
  label,
  hint,
  error,
  options,
  id: givenId,
  className = '',
  ...rest
}: SelectFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      <select
        id={id}
        className={`${controlClasses} ${className}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}

interface TextAreaFieldProps extends Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  id?: string;
}

export function TextAreaField({
  label,
  hint,
  error,
  id: givenId,
  className = '',
  rows = 3,
  ...rest
}: TextAreaFieldProps) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      <textarea
        id={id}
        rows={rows}
        className={`${controlClasses} py-2 leading-normal ${className}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        {...rest}
      />
    </FieldFrame>
  );
}
