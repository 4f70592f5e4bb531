// The fields of a measurement: what to measure, the readings with their quantity, unit and
// allowed range, the branches tried in order (each a condition formula), and "Otherwise".
import {
  quantities,
  type Branch,
  type MeasurementInput,
  type MeasurementNode,
  type TreeQuantity,
} from '@heatpath/fault-tree';
import { Button } from '../../../components/ui/button';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { pathKey, valueNameFrom } from '../draft-model';
import { canonicalUnit, entryUnitsWords, quantityLabels, unitLabel } from '../units-format';
import {
  ListRow,
  ListSection,
  moveItem,
  NumberField,
  removeItem,
  replaceItem,
  TargetSelect,
  type FormContext,
} from './editor-fields';
import { FormulaField } from './formula-field';

const quantityOptions = quantities.map((quantity) => ({
  value: quantity,
  label: quantityLabels[quantity],
}));

export function MeasurementFields({
  id,
  node,
  onChange,
  context,
}: {
  id: string;
  node: MeasurementNode;
  onChange: (patch: Partial<MeasurementNode>) => void;
  context: FormContext;
}) {
  const path = ['nodes', id] as const;
  const { errorAt, options } = context;
  const { inputs, branches } = node;

  const updateInput = (index: number, input: MeasurementInput, patch: Partial<MeasurementInput>) =>
    onChange({ inputs: replaceItem(inputs, index, { ...input, ...patch }) });
  const updateBranch = (index: number, branch: Branch, patch: Partial<Branch>) =>
    onChange({ branches: replaceItem(branches, index, { ...branch, ...patch }) });

  return (
    <>
      <TextAreaField
        label="What to measure"
        value={node.prompt ?? ''}
        data-path={pathKey([...path, 'prompt'])}
        error={errorAt([...path, 'prompt'])}
        onChange={(event) => onChange({ prompt: event.target.value })}
      />

      <ListSection
        title="Readings"
        hint="Each reading is stored in its quantity’s own unit; the technician may type it in the other units of that quantity."
        addLabel="Add reading"
        onAdd={() =>
          onChange({
            inputs: [
              ...inputs,
              {
                name: valueNameFrom('reading', new Set(Object.keys(context.names))),
                label: '',
                quantity: 'temperature',
                unit: 'degC',
                range: { min: -40, max: 150 },
              },
            ],
          })
        }
      >
        {inputs.map((input, index) => {
          const at = [...path, 'inputs', index];
          const canonical = canonicalUnit(input.quantity);
          const unitProblem = errorAt([...at, 'unit']);
          return (
            <ListRow
              key={index}
              legend={`Reading ${index + 1}${input.label ? `: ${input.label}` : ''}`}
              onRemove={() => onChange({ inputs: removeItem(inputs, index) })}
            >
              <div className="grid gap-3 sm:grid-cols-2">
                <TextField
                  label="Label"
                  value={input.label}
                  data-path={pathKey([...at, 'label'])}
                  error={errorAt([...at, 'label'])}
                  onChange={(event) => updateInput(index, input, { label: event.target.value })}
                />
                <TextField
                  label="Name in formulas"
                  value={input.name}
                  spellCheck={false}
                  autoComplete="off"
                  className="font-mono"
                  data-path={pathKey([...at, 'name'])}
                  error={errorAt([...at, 'name'])}
                  onChange={(event) => updateInput(index, input, { name: event.target.value })}
                />
                <SelectField
                  label="Quantity"
                  options={quantityOptions}
                  value={input.quantity}
                  data-path={pathKey([...at, 'quantity'])}
                  error={errorAt([...at, 'quantity'])}
                  onChange={(event) => {
                    const quantity = event.target.value as TreeQuantity;
                    updateInput(index, input, { quantity, unit: canonicalUnit(quantity) });
                  }}
                />
                <div className="flex flex-col gap-1.5">
                  <span className="font-semibold">Stored in</span>
                  <span className="flex min-h-touch items-center rounded-control bg-sunken px-3 font-semibold">
                    {unitLabel(input.unit)}
                  </span>
                  <span className="text-sm text-ink-muted">
                    Can be typed in {entryUnitsWords(input.quantity)}
                  </span>
                  {unitProblem && input.unit !== canonical ? (
                    <Button
                      variant="secondary"
                      onClick={() => updateInput(index, input, { unit: canonical })}
                    >
                      Store in {unitLabel(canonical)}
                    </Button>
                  ) : null}
                </div>
                <NumberField
                  label="Lowest allowed"
                  value={input.range.min}
                  suffix={unitLabel(input.unit)}
                  path={[...at, 'range', 'min']}
                  errorAt={(p) => errorAt(p) ?? errorAt([...at, 'range'])}
                  onChange={(min) =>
                    updateInput(index, input, { range: { ...input.range, min: min as number } })
                  }
                />
                <NumberField
                  label="Highest allowed"
                  value={input.range.max}
                  suffix={unitLabel(input.unit)}
                  path={[...at, 'range', 'max']}
                  errorAt={errorAt}
                  onChange={(max) =>
                    updateInput(index, input, { range: { ...input.range, max: max as number } })
                  }
                />
              </div>
              <TextField
                label="Hint (optional)"
                value={input.hint ?? ''}
                data-path={pathKey([...at, 'hint'])}
                onChange={(event) =>
                  updateInput(index, input, { hint: event.target.value || undefined })
                }
              />
            </ListRow>
          );
        })}
      </ListSection>

      <ListSection
        title="Branches, tried in order"
        hint="The first branch whose condition holds decides the next step. Conditions may use this step’s readings, earlier readings and computed values."
        addLabel="Add branch"
        error={errorAt([...path, 'branches'])}
        onAdd={() => onChange({ branches: [...branches, { when: '', to: '' }] })}
      >
        {branches.map((branch, index) => {
          const at = [...path, 'branches', index];
          return (
            <ListRow
              key={index}
              legend={`Branch ${index + 1}${branch.label ? `: ${branch.label}` : ''}`}
              onRemove={() => onChange({ branches: removeItem(branches, index) })}
              onMoveUp={
                index > 0
                  ? () => onChange({ branches: moveItem(branches, index, index - 1) })
                  : undefined
              }
              onMoveDown={
                index < branches.length - 1
                  ? () => onChange({ branches: moveItem(branches, index, index + 1) })
                  : undefined
              }
            >
              <FormulaField
                label="Condition"
                value={branch.when}
                expect="condition"
                names={context.names}
                samples={context.samples}
                onSampleChange={context.onSampleChange}
                path={[...at, 'when']}
                errorAt={errorAt}
                onChange={(when) => updateBranch(index, branch, { when })}
              />
              <TargetSelect
                label="Leads to"
                value={branch.to}
                options={options}
                exclude={id}
                path={[...at, 'to']}
                errorAt={errorAt}
                setAt={context.setAt}
              />
              <TextField
                label="Label (optional)"
                hint="Shown to the technician as the reason, e.g. “Large drop”."
                value={branch.label ?? ''}
                data-path={pathKey([...at, 'label'])}
                error={errorAt([...at, 'label'])}
                onChange={(event) =>
                  updateBranch(index, branch, { label: event.target.value || undefined })
                }
              />
            </ListRow>
          );
        })}
      </ListSection>

      <section className="flex flex-col gap-3">
        <h3 className="text-lg font-bold">Otherwise</h3>
        <label className="flex min-h-touch items-center gap-3">
          <input
            type="checkbox"
            className="size-5 accent-primary"
            checked={node.fallback !== undefined}
            onChange={(event) =>
              onChange({
                fallback: event.target.checked ? { to: '', label: 'Otherwise' } : undefined,
              })
            }
          />
          <span>When no branch holds, go on to a step</span>
        </label>
        {node.fallback ? (
          <div className="grid gap-3 sm:grid-cols-2">
            <TargetSelect
              label="Otherwise leads to"
              value={node.fallback.to}
              options={options}
              exclude={id}
              path={[...path, 'fallback', 'to']}
              errorAt={errorAt}
              setAt={context.setAt}
            />
            <TextField
              label="Otherwise label (optional)"
              value={node.fallback.label ?? ''}
              onChange={(event) =>
                onChange({
                  fallback: { to: node.fallback?.to ?? '', label: event.target.value || undefined },
                })
              }
            />
          </div>
        ) : (
          <p className="text-sm text-ink-muted">
            Without “Otherwise”, every reading in the allowed ranges must match a branch.
          </p>
        )}
      </section>
    </>
  );
}
