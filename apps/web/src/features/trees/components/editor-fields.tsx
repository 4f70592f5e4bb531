// Building blocks of the node forms: number boxes that keep what is being typed, the "leads to"
// choice of step, lists of short texts, the hazard checklist and a row of list actions. Each
// control carries `data-path`, the definition path validation names, so a problem in the list
// can take the lead straight to the box it is about.
import type { HazardKind, Quantity } from '@heatpath/fault-tree';
import { memo, useId, useState, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { FieldError, SelectField, TextField } from '../../../components/ui/field';
import { hazardKinds, pathKey } from '../draft-model';
import { readNumber } from '../../../lib/read-number';
import { hazardLabels } from '../../../lib/step-labels';

export type Path = readonly (string | number)[];

/** Looks up the problem message validation gave for a path, if any. */
export type ErrorAt = (path: Path) => string | undefined;

interface NumberFieldProps {
  label: ReactNode;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  path: Path;
  errorAt: ErrorAt;
  hint?: ReactNode;
  suffix?: ReactNode;
}

/** A number box: keeps the text as typed ("1," on the way to "1,5") and stores only numbers. */
export function NumberField({
  label,
  value,
  onChange,
  path,
  errorAt,
  hint,
  suffix,
}: NumberFieldProps) {
  const [text, setText] = useState(value === undefined ? '' : String(value));
  const [shown, setShown] = useState(value);
  // The value changed from outside (a reload, another box): show it.
  if (shown !== value) {
    setShown(value);
    const typed = readNumber(text);
    if (typed !== value) setText(value === undefined ? '' : String(value));
  }
  const typed = readNumber(text);
  const local = typed !== null && Number.isNaN(typed) ? 'Enter a number, such as 12.5.' : undefined;
  return (
    <TextField
      label={label}
      hint={hint}
      suffix={suffix}
      value={text}
      inputMode="decimal"
      autoComplete="off"
      data-path={pathKey(path)}
      error={local ?? errorAt(path)}
      onChange={(event) => {
        const next = event.target.value;
        setText(next);
        const parsed = readNumber(next);
        if (parsed === null) {
          setShown(undefined);
          onChange(undefined);
        } else if (!Number.isNaN(parsed)) {
          setShown(parsed);
          onChange(parsed);
        }
      }}
    />
  );
}

export interface StepOption {
  id: string;
  title: string;
}

/** Sets one value of the working copy by its definition path; stable for the editor's life. */
export type SetAt = (path: Path, value: unknown) => void;

interface TargetSelectProps {
  label: string;
  value: string | undefined;
  options: readonly StepOption[];
  path: Path;
  errorAt: ErrorAt;
  /** Writes the choice; a target select writes by path so it can skip re-rendering its options. */
  setAt: SetAt;
  hint?: ReactNode;
  /** Leaves out the step the choice belongs to: a step never leads to itself. */
  exclude?: string;
  /** Shown for no target. */
  emptyLabel?: string;
  /** An emptied choice removes the field (a procedure's way on) instead of storing ''. */
  removeWhenEmpty?: boolean;
}

export function TargetSelect({ errorAt, ...props }: TargetSelectProps) {
  const error = errorAt(props.path);
  // Validation says an empty target "leads to \"\"": under the box, say what to do instead.
  return (
    <TargetSelectControl
      {...props}
      error={error && !props.value ? 'Choose the step this leads to.' : error}
    />
  );
}

type TargetSelectControlProps = Omit<TargetSelectProps, 'errorAt'> & { error: string | undefined };

// A tree of 300 steps gives every "Leads to" box 300 choices; re-render them only when the
// steps, this box's value or its problem changed, not on every keystroke elsewhere in the form.
const TargetSelectControl = memo(
  function TargetSelectControl({
    label,
    value,
    options,
    path,
    setAt,
    hint,
    exclude,
    emptyLabel = 'Choose a step',
    removeWhenEmpty = false,
    error,
  }: TargetSelectControlProps) {
    const known = options.some((option) => option.id === value);
    const choices = [
      { value: '', label: emptyLabel },
      ...(value && !known ? [{ value, label: `“${value}” (no such step)` }] : []),
      ...options
        .filter((option) => option.id !== exclude)
        .map((option) => ({ value: option.id, label: option.title })),
    ];
    return (
      <SelectField
        label={label}
        hint={hint}
        options={choices}
        value={value ?? ''}
        data-path={pathKey(path)}
        error={error}
        onChange={(event) => setAt(path, event.target.value || (removeWhenEmpty ? undefined : ''))}
      />
    );
  },
  (a, b) =>
    a.value === b.value &&
    a.label === b.label &&
    a.options === b.options &&
    a.exclude === b.exclude &&
    a.error === b.error &&
    a.hint === b.hint &&
    a.emptyLabel === b.emptyLabel &&
    a.removeWhenEmpty === b.removeWhenEmpty &&
    a.setAt === b.setAt &&
    pathKey(a.path) === pathKey(b.path),
);

interface ListRowProps {
  legend: string;
  children: ReactNode;
  onRemove: () => void;
  onMoveUp?: (() => void) | undefined;
  onMoveDown?: (() => void) | undefined;
}

/** One entry of a list in a form (an answer, a reading, a part), with its own actions. */
export function ListRow({ legend, children, onRemove, onMoveUp, onMoveDown }: ListRowProps) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-3 rounded-control border-2 border-line p-3">
      <legend className="px-1 font-semibold">{legend}</legend>
      {children}
      <div className="flex flex-wrap gap-2">
        {onMoveUp ? (
          <Button variant="secondary" onClick={onMoveUp}>
            <span aria-hidden="true">↑</span> Move up<span className="sr-only">: {legend}</span>
          </Button>
        ) : null}
        {onMoveDown ? (
          <Button variant="secondary" onClick={onMoveDown}>
            <span aria-hidden="true">↓</span> Move down<span className="sr-only">: {legend}</span>
          </Button>
        ) : null}
        <Button variant="danger" onClick={onRemove}>
          Remove<span className="sr-only"> {legend}</span>
        </Button>
      </div>
    </fieldset>
  );
}

/** A titled block of list rows with the button that adds one more. */
export function ListSection({
  title,
  hint,
  addLabel,
  onAdd,
  error,
  children,
}: {
  title: string;
  hint?: ReactNode;
  addLabel: string;
  onAdd: () => void;
  error?: string | undefined;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h3 id={id} className="text-lg font-bold">
        {title}
      </h3>
      {hint ? <p className="text-sm text-ink-muted">{hint}</p> : null}
      {error ? <FieldError id={`${id}-error`} message={error} /> : null}
      {children}
      <div>
        <Button variant="secondary" onClick={onAdd}>
          <span aria-hidden="true">+</span> {addLabel}
        </Button>
      </div>
    </section>
  );
}

export function moveItem<T>(list: readonly T[], from: number, to: number): T[] {
  const next = [...list];
  const [item] = next.splice(from, 1);
  if (item !== undefined) next.splice(to, 0, item);
  return next;
}

export function replaceItem<T>(list: readonly T[], index: number, item: T): T[] {
  return list.map((existing, i) => (i === index ? item : existing));
}

export function removeItem<T>(list: readonly T[], index: number): T[] {
  return list.filter((_, i) => i !== index);
}

interface TextListProps {
  title: string;
  itemLabel: (index: number) => string;
  addLabel: string;
  items: readonly string[];
  onChange: (items: string[]) => void;
  path: Path;
  errorAt: ErrorAt;
  hint?: ReactNode;
}

/** A list of short texts (tools, follow-ups, notes on applicability). */
export function TextList({
  title,
  itemLabel,
  addLabel,
  items,
  onChange,
  path,
  errorAt,
  hint,
}: TextListProps) {
  return (
    <ListSection
      title={title}
      hint={hint}
      addLabel={addLabel}
      onAdd={() => onChange([...items, ''])}
    >
      {items.map((item, index) => (
        <div key={index} className="flex items-end gap-2">
          <div className="min-w-0 flex-1">
            <TextField
              label={itemLabel(index)}
              value={item}
              data-path={pathKey([...path, index])}
              error={errorAt([...path, index])}
              onChange={(event) => onChange(replaceItem(items, index, event.target.value))}
            />
          </div>
          <Button variant="danger" onClick={() => onChange(removeItem(items, index))}>
            Remove<span className="sr-only"> {itemLabel(index)}</span>
          </Button>
        </div>
      ))}
    </ListSection>
  );
}

/** Which hazards a step carries; each needs a caution of its kind (validation checks it). */
export function HazardChecklist({
  value,
  onChange,
  path,
  errorAt,
}: {
  value: readonly HazardKind[];
  onChange: (value: HazardKind[]) => void;
  path: Path;
  errorAt: ErrorAt;
}) {
  const error = errorAt(path);
  return (
    <fieldset className="flex flex-col gap-2" data-path={pathKey(path)}>
      <legend className="mb-1 text-lg font-bold">Hazards at this step</legend>
      <p className="text-sm text-ink-muted">
        Each hazard ticked here needs a caution of the same kind below, so the warning shows where
        the danger is.
      </p>
      <div className="grid gap-2 sm:grid-cols-2">
        {hazardKinds.map((hazard) => (
          <label
            key={hazard}
            className="flex min-h-touch cursor-pointer items-center gap-3 rounded-control border-2 border-line-strong bg-surface px-3 has-focus-visible:outline-3 has-focus-visible:outline-focus"
          >
            <input
              type="checkbox"
              className="size-5 shrink-0 accent-primary"
              checked={value.includes(hazard)}
              onChange={(event) =>
                onChange(
                  event.target.checked
                    ? [...value, hazard]
                    : value.filter((existing) => existing !== hazard),
                )
              }
            />
            <span>{hazardLabels[hazard]}</span>
          </label>
        ))}
      </div>
      {error ? <FieldError id={`${pathKey(path)}-error`} message={error} /> : null}
    </fieldset>
  );
}

export const hazardOptions = hazardKinds.map((hazard) => ({
  value: hazard,
  label: hazardLabels[hazard],
}));

/** What every node form needs besides its node: the steps to lead to, problems, formula names. */
export interface FormContext {
  options: readonly StepOption[];
  setAt: SetAt;
  errorAt: ErrorAt;
  names: Readonly<Record<string, Quantity>>;
  samples: Readonly<Record<string, string>>;
  onSampleChange: (name: string, text: string) => void;
}
