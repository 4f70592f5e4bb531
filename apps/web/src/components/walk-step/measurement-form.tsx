// A measurement step: one box per reading with its own unit, checked and worked out as it is
// typed by the same fault-tree code the server runs (range problems under the box, computed
// values, and the step it would lead to). The readings are sent as typed, with their units; the
// server converts them, so a reading in °F is stored as entered and in °C. The feature decides
// what a saved answer does: the case page sends it, Try it applies it in the browser.
// With a `draftId` the typed readings and chosen units are kept on the tablet (lib/reading-drafts)
// as they change, so a reload finds them again; the draft goes once the step is answered. A unit
// chosen in a box becomes the person's preference, so the next step's boxes start in it; a
// draft's own units win over the preference for that step.
import type { UnitPreferences } from '@heatpath/contracts';
import {
  formatNumber,
  formatWithUnit,
  fromCanonical,
  previewReadings,
  type CompiledTree,
  type MeasurementInput,
  type MeasurementNode,
  type Reading,
  type UnitCode,
  type WalkEvent,
  type WalkSnapshot,
} from '@heatpath/fault-tree';
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import { readNumber } from '../../lib/read-number';
import { clearReadingDraft, loadReadingDraft, saveReadingDraft } from '../../lib/reading-drafts';
import {
  computedDisplay,
  preferenceForUnit,
  preferredUnit,
  unitOptions,
  unitsAsEntered,
} from '../../lib/reading-units';
import { useUpdateUnitPreferences } from '../../lib/unit-preferences';
import { Button } from '../ui/button';
import { TextField } from '../ui/field';
import { BlockedReason } from './blocked-reason';

/** The compiled tree and the walk so far, from which readings are previewed as they are typed. */
export interface WalkModel {
  tree: CompiledTree;
  snapshot: WalkSnapshot;
}

interface MeasurementFormProps {
  node: MeasurementNode & { id: string };
  position: number;
  model: WalkModel | null;
  /**
   * The person's units; without them (Try it) boxes start in the unit the tree names, and a unit
   * chosen is not saved as a preference.
   */
  preferences?: UnitPreferences;
  disabled?: boolean;
  /** What the server said was wrong with each reading of the last attempt. */
  refusedFields?: Readonly<Record<string, string>>;
  /** Where the typed readings are kept until answered (readingDraftId); none in Try it. */
  draftId?: string;
  /** Why the step cannot be answered yet; the button is disabled while it is set. */
  blockedReason?: string | null;
  onAnswer: (event: WalkEvent, label: string) => void;
}

/** "Allowed 32 to 302 °F": the input's range in the unit chosen for the box. */
export function allowedRange(input: MeasurementInput, unit: UnitCode): string {
  const min = fromCanonical(input.range.min, unit, input.quantity);
  const max = fromCanonical(input.range.max, unit, input.quantity);
  return `Allowed ${withMinus(formatNumber(min))} to ${withMinus(formatWithUnit(max, unit))}`;
}

function withMinus(text: string): string {
  return text.replace(/^-/, '−');
}

export function MeasurementForm({
  node,
  position,
  model,
  preferences,
  disabled = false,
  refusedFields = {},
  draftId,
  blockedReason = null,
  onAnswer,
}: MeasurementFormProps) {
  const [draft] = useState(() => (draftId ? loadReadingDraft(draftId) : null));
  const [typed, setTyped] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      node.inputs.flatMap((input) => {
        const value = draft?.values[input.name];
        return value === undefined ? [] : [[input.name, value]];
      }),
    ),
  );
  const [units, setUnits] = useState<Record<string, UnitCode>>(() =>
    Object.fromEntries(
      node.inputs.map((input) => {
        const drafted = draft?.units[input.name];
        const offered = unitOptions(input.quantity).some((option) => option.value === drafted);
        return [
          input.name,
          drafted && offered
            ? drafted
            : preferences
              ? preferredUnit(input.quantity, preferences)
              : input.unit,
        ];
      }),
    ),
  );
  const [tried, setTried] = useState(false);
  // Server refusals belong to the readings that were sent; editing a box clears its own.
  const [edited, setEdited] = useState<ReadonlySet<string>>(new Set());
  const savePreference = useUpdateUnitPreferences();
  const reasonId = useId();

  // The draft follows every change the person makes (not the boxes' starting state).
  const [changed, setChanged] = useState(false);
  useEffect(() => {
    if (draftId && changed) saveReadingDraft(draftId, { values: typed, units });
  }, [draftId, changed, typed, units]);

  // Answered: the draft goes when the step is left. A refusal or a new edit keeps it.
  const answered = useRef(false);
  useEffect(() => {
    if (Object.keys(refusedFields).length > 0) answered.current = false;
  }, [refusedFields]);
  useEffect(() => {
    if (!draftId) return;
    return () => {
      if (answered.current) clearReadingDraft(draftId);
    };
  }, [draftId]);

  const readings = useMemo(() => {
    const entered: Record<string, Reading> = {};
    for (const input of node.inputs) {
      const value = readNumber(typed[input.name] ?? '');
      const unit = units[input.name];
      if (value !== null && !Number.isNaN(value) && unit) entered[input.name] = { value, unit };
    }
    return entered;
  }, [node.inputs, typed, units]);

  const preview = useMemo(
    () => (model ? previewReadings(model.tree, model.snapshot, readings) : null),
    [model, readings],
  );

  const inputNames = new Set(node.inputs.map((input) => input.name));
  const relevant = model
    ? model.tree.formulas.computed
        .filter((entry) => entry.inputs.some((name) => inputNames.has(name)))
        .map((entry) => entry.value.name)
    : [];
  const liveValues = (preview?.computed ?? []).filter((view) => relevant.includes(view.name));
  const shownUnits = preferences ? unitsAsEntered(preferences, Object.values(units)) : null;
  const next = preview?.toNodeId ? model?.tree.nodes.get(preview.toNodeId) : undefined;

  const problemFor = (input: MeasurementInput): string | undefined => {
    const text = typed[input.name] ?? '';
    const value = readNumber(text);
    if (value !== null && Number.isNaN(value)) return 'Enter a number, such as 92.5.';
    if (value === null) return tried ? `Enter “${input.label}”.` : undefined;
    return (
      preview?.fields[input.name] ??
      (edited.has(input.name) ? undefined : refusedFields[input.name])
    );
  };

  const change = (name: string, update: () => void) => {
    update();
    answered.current = false;
    setChanged(true);
    setEdited((before) => new Set(before).add(name));
  };

  const chooseUnit = (input: MeasurementInput, unit: UnitCode) => {
    change(input.name, () => setUnits((before) => ({ ...before, [input.name]: unit })));
    if (!preferences) return;
    const wanted = preferenceForUnit(input.quantity, unit);
    const differs = Object.entries(wanted).some(
      ([key, value]) => preferences[key as keyof UnitPreferences] !== value,
    );
    if (differs) savePreference.mutate({ units: wanted });
  };

  const submit = () => {
    setTried(true);
    if (blockedReason) return;
    const complete = node.inputs.every((input) => readings[input.name] !== undefined);
    const clean = node.inputs.every((input) => !preview?.fields[input.name]);
    if (!complete || !clean) return;
    const label = node.inputs
      .map((input) => {
        const reading = readings[input.name];
        return reading ? `${input.label} ${formatWithUnit(reading.value, reading.unit)}` : '';
      })
      .join(', ');
    setEdited(new Set());
    answered.current = true;
    onAnswer(
      { type: 'answer.measurement', nodeId: node.id, position, readings },
      node.inputs.length > 0 ? `Readings: ${label}` : 'Continue',
    );
  };

  const nextLine = next ? (
    <p aria-live="polite">
      <span className="font-semibold">Next: </span>
      {next.kind === 'outcome' ? `finding “${next.title}”` : next.title}
    </p>
  ) : null;

  const buttonLabel =
    node.inputs.length === 0
      ? 'Continue'
      : node.inputs.length === 1
        ? 'Save reading'
        : 'Save readings';

  return (
    <form
      noValidate
      aria-label="Readings"
      className="flex flex-col gap-5"
      onSubmit={(event) => {
        event.preventDefault();
        submit();
      }}
    >
      {node.inputs.map((input) => {
        const unit = units[input.name] ?? input.unit;
        const options = unitOptions(input.quantity);
        const signed = input.range.min < 0;
        const text = typed[input.name] ?? '';
        return (
          <TextField
            key={input.name}
            label={input.label}
            labelAside={allowedRange(input, unit)}
            hint={input.hint}
            error={problemFor(input)}
            value={text}
            disabled={disabled}
            onChange={(event) =>
              change(input.name, () =>
                setTyped((before) => ({ ...before, [input.name]: event.target.value })),
              )
            }
            inputMode={signed ? 'text' : 'decimal'}
            autoComplete="off"
            spellCheck={false}
            enterKeyHint="done"
            className="text-lg"
            after={
              <>
                {signed ? (
                  <button
                    type="button"
                    disabled={disabled}
                    onClick={() =>
                      change(input.name, () =>
                        setTyped((before) => ({
                          ...before,
                          [input.name]: /^[-−]/.test(text.trim())
                            ? text.trim().slice(1)
                            : `-${text.trim()}`,
                        })),
                      )
                    }
                    className="min-h-touch min-w-touch shrink-0 rounded-control border-2 border-line-strong bg-surface px-3 text-lg font-bold hover:bg-sunken disabled:opacity-60"
                  >
                    <span aria-hidden="true">±</span>
                    <span className="sr-only">Change the sign of {input.label}</span>
                  </button>
                ) : null}
                {options.length > 1 ? (
                  <select
                    aria-label={`Unit for ${input.label}`}
                    value={unit}
                    disabled={disabled}
                    onChange={(event) => {
                      const chosen = options.find((option) => option.value === event.target.value);
                      if (chosen) chooseUnit(input, chosen.value);
                    }}
                    className="min-h-touch shrink-0 rounded-control border-2 border-line-strong bg-sunken px-3 text-base font-semibold"
                  >
                    {options.map((option) => (
                      <option key={option.value} value={option.value}>
                        {option.label}
                      </option>
                    ))}
                  </select>
                ) : options[0]?.label && options[0].label !== 'number' ? (
                  <span className="flex min-w-14 shrink-0 items-center justify-center rounded-control bg-sunken px-3 font-semibold">
                    {options[0].label}
                  </span>
                ) : null}
              </>
            }
          />
        );
      })}

      {liveValues.length > 0 ? (
        <section
          aria-label="Worked out as you type"
          className="flex flex-col gap-2 rounded-control bg-sunken px-4 py-3"
        >
          <dl className="flex flex-col gap-1" aria-live="polite">
            {liveValues.map((view) => (
              <div
                key={view.name}
                className="flex flex-wrap items-baseline justify-between gap-x-3"
              >
                <dt>{view.label}</dt>
                <dd className="text-xl font-bold">
                  {(shownUnits ? computedDisplay(view, shownUnits) : view.display) ?? (
                    <span className="text-base font-normal text-ink-muted">
                      waiting for readings
                    </span>
                  )}
                </dd>
              </div>
            ))}
          </dl>
          {nextLine}
        </section>
      ) : (
        nextLine
      )}

      {/* On a narrow screen long cautions can push the button below the edge; it then rides along
          at the bottom (above the phone's menu bar) while the boxes are in view. */}
      <div className="sticky bottom-20 z-10 -mx-1 flex flex-col gap-2 rounded-control bg-surface p-1 md:bottom-2 lg:static lg:m-0 lg:p-0">
        {blockedReason ? <BlockedReason id={reasonId} reason={blockedReason} /> : null}
        <Button
          type="submit"
          size="large"
          disabled={disabled || Boolean(blockedReason)}
          aria-describedby={blockedReason ? reasonId : undefined}
          className="w-full sm:w-auto sm:self-start"
        >
          {buttonLabel}
        </Button>
      </div>
    </form>
  );
}
