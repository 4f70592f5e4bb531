// The tree's own fields: title, symptom, summary, where it applies, the first step, and the
// computed values worked out from readings (each a formula of a declared quantity).
import { quantities, type ComputedValue, type TreeQuantity } from '@heatpath/fault-tree';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { pathKey, valueNameFrom, type EditableTree } from '../draft-model';
import { canonicalUnit, quantityLabels, unitLabel } from '../units-format';
import {
  ListRow,
  ListSection,
  removeItem,
  replaceItem,
  TargetSelect,
  TextList,
  type FormContext,
} from './editor-fields';
import { FormulaField } from './formula-field';

const quantityOptions = quantities.map((quantity) => ({
  value: quantity,
  label: quantityLabels[quantity],
}));

export function TreeDetailsForm({
  tree,
  onChange,
  context,
}: {
  tree: EditableTree;
  onChange: (patch: Partial<EditableTree>) => void;
  context: FormContext;
}) {
  const { errorAt } = context;
  const computed = tree.computed;
  const update = (index: number, value: ComputedValue, patch: Partial<ComputedValue>) =>
    onChange({ computed: replaceItem(computed, index, { ...value, ...patch }) });
  return (
    <div
      role="group"
      aria-labelledby="tree-details-heading"
      tabIndex={-1}
      className="flex flex-col gap-5 focus-visible:outline-none"
    >
      <h2 id="tree-details-heading" className="text-xl font-bold">
        Tree details
      </h2>
      <TextField
        label="Title"
        value={tree.title}
        data-path="title"
        error={errorAt(['title'])}
        onChange={(event) => onChange({ title: event.target.value })}
      />
      <TextAreaField
        label="Symptom"
        hint="The complaint the tree starts from, as a technician would pick it."
        rows={2}
        value={tree.symptom}
        data-path="symptom"
        error={errorAt(['symptom'])}
        onChange={(event) => onChange({ symptom: event.target.value })}
      />
      <TextAreaField
        label="Summary (optional)"
        value={tree.summary ?? ''}
        data-path="summary"
        error={errorAt(['summary'])}
        onChange={(event) => onChange({ summary: event.target.value || undefined })}
      />
      <TargetSelect
        label="First step"
        value={tree.start}
        options={context.options}
        path={['start']}
        errorAt={errorAt}
        setAt={context.setAt}
      />
      <TextList
        title="Applies to"
        hint="Which engines and systems the tree suits."
        itemLabel={(index) => `Applies to ${index + 1}`}
        addLabel="Add note"
        items={tree.applicability}
        onChange={(applicability) => onChange({ applicability })}
        path={['applicability']}
        errorAt={errorAt}
      />
      <ListSection
        title="Computed values"
        hint="Worked out from readings as soon as they are taken, shown live during the walk and usable in branch conditions."
        addLabel="Add computed value"
        error={errorAt(['computed'])}
        onAdd={() =>
          onChange({
            computed: [
              ...computed,
              {
                name: valueNameFrom('computed value', new Set(Object.keys(context.names))),
                label: '',
                formula: '',
                quantity: 'temperatureDelta',
                unit: 'K',
              },
            ],
          })
        }
      >
        {computed.map((value, index) => {
          const at = ['computed', index];
          return (
            <ListRow
              key={index}
              legend={`Computed value ${index + 1}${value.label ? `: ${value.label}` : ''}`}
              onRemove={() => onChange({ computed: removeItem(computed, index) })}
            >
              <div className="grid gap-3 sm:grid-cols-2">
                <TextField
                  label="Label"
                  value={value.label}
                  data-path={pathKey([...at, 'label'])}
                  error={errorAt([...at, 'label'])}
                  onChange={(event) => update(index, value, { label: event.target.value })}
                />
                <TextField
                  label="Name in formulas"
                  value={value.name}
                  className="font-mono"
                  spellCheck={false}
                  data-path={pathKey([...at, 'name'])}
                  error={errorAt([...at, 'name'])}
                  onChange={(event) => update(index, value, { name: event.target.value })}
                />
                <SelectField
                  label="Quantity"
                  options={quantityOptions}
                  value={value.quantity}
                  data-path={pathKey([...at, 'quantity'])}
                  error={errorAt([...at, 'quantity'])}
                  onChange={(event) => {
                    const quantity = event.target.value as TreeQuantity;
                    update(index, value, { quantity, unit: canonicalUnit(quantity) });
                  }}
                />
                <div className="flex flex-col gap-1.5">
                  <span className="font-semibold">Unit</span>
                  <span className="flex min-h-touch items-center rounded-control bg-sunken px-3 font-semibold">
                    {unitLabel(value.unit)}
                  </span>
                </div>
              </div>
              <FormulaField
                label="Formula"
                value={value.formula}
                expect={value.quantity}
                names={context.names}
                samples={context.samples}
                onSampleChange={context.onSampleChange}
                path={[...at, 'formula']}
                errorAt={errorAt}
                onChange={(formula) => update(index, value, { formula })}
              />
            </ListRow>
          );
        })}
      </ListSection>
    </div>
  );
}
