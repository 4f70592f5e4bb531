// Fields every step shares (question, measurement, procedure): notes, tools, time, the evidence
// it asks for, and hazards with their cautions — the last also on findings, for the repair.
import type { Caution, EvidenceRequest, HazardKind, StepNode } from '@heatpath/fault-tree';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { pathKey } from '../draft-model';
import {
  HazardChecklist,
  hazardOptions,
  ListRow,
  ListSection,
  NumberField,
  removeItem,
  replaceItem,
  TextList,
  type ErrorAt,
  type Path,
} from './editor-fields';

export function SafetyFields({
  hazards,
  cautions,
  onChange,
  path,
  errorAt,
}: {
  hazards: readonly HazardKind[];
  cautions: readonly Caution[];
  onChange: (patch: { hazards?: HazardKind[]; cautions?: Caution[] }) => void;
  path: Path;
  errorAt: ErrorAt;
}) {
  return (
    <>
      <HazardChecklist
        value={hazards}
        onChange={(next) => onChange({ hazards: next })}
        path={[...path, 'hazards']}
        errorAt={errorAt}
      />
      <ListSection
        title="Cautions"
        hint="What the technician reads before the instruction. Write them for a cold, safe system and defer to the maker’s procedure."
        addLabel="Add caution"
        onAdd={() =>
          onChange({
            cautions: [
              ...cautions,
              {
                hazard: hazards.find((h) => !cautions.some((c) => c.hazard === h)) ?? 'hot-surface',
                text: '',
              },
            ],
          })
        }
      >
        {cautions.map((caution, index) => {
          const at = [...path, 'cautions', index];
          return (
            <ListRow
              key={index}
              legend={`Caution ${index + 1}`}
              onRemove={() => onChange({ cautions: removeItem(cautions, index) })}
            >
              <SelectField
                label="Hazard"
                options={hazardOptions}
                value={caution.hazard}
                data-path={pathKey([...at, 'hazard'])}
                error={errorAt([...at, 'hazard'])}
                onChange={(event) =>
                  onChange({
                    cautions: replaceItem(cautions, index, {
                      ...caution,
                      hazard: event.target.value as HazardKind,
                    }),
                  })
                }
              />
              <TextAreaField
                label="Caution text"
                rows={2}
                value={caution.text}
                data-path={pathKey([...at, 'text'])}
                error={errorAt([...at, 'text'])}
                onChange={(event) =>
                  onChange({
                    cautions: replaceItem(cautions, index, {
                      ...caution,
                      text: event.target.value,
                    }),
                  })
                }
              />
            </ListRow>
          );
        })}
      </ListSection>
    </>
  );
}

export function StepExtras({
  node,
  onChange,
  path,
  errorAt,
}: {
  node: StepNode;
  onChange: (patch: Partial<StepNode>) => void;
  path: Path;
  errorAt: ErrorAt;
}) {
  const evidence = node.evidence;
  return (
    <>
      <NumberField
        label={node.kind === 'procedure' ? 'Estimated minutes' : 'Estimated minutes (optional)'}
        value={node.estimatedMinutes}
        // An emptied box leaves the field undefined, which JSON leaves out when it is saved.
        onChange={(value) => onChange({ estimatedMinutes: value } as Partial<StepNode>)}
        suffix="min"
        path={[...path, 'estimatedMinutes']}
        errorAt={errorAt}
      />
      <TextList
        title="Tools"
        itemLabel={(index) => `Tool ${index + 1}`}
        addLabel="Add tool"
        items={node.tools}
        onChange={(tools) => onChange({ tools })}
        path={[...path, 'tools']}
        errorAt={errorAt}
      />
      <ListSection
        title="Evidence asked for"
        hint="Photos or data logs the technician is asked to attach at this step."
        addLabel="Add evidence"
        onAdd={() =>
          onChange({ evidence: [...evidence, { kind: 'photo', label: '', required: false }] })
        }
      >
        {evidence.map((item, index) => {
          const at = [...path, 'evidence', index];
          const update = (patch: Partial<EvidenceRequest>) =>
            onChange({ evidence: replaceItem(evidence, index, { ...item, ...patch }) });
          return (
            <ListRow
              key={index}
              legend={`Evidence ${index + 1}`}
              onRemove={() => onChange({ evidence: removeItem(evidence, index) })}
            >
              <SelectField
                label="Kind"
                options={[
                  { value: 'photo', label: 'Photo' },
                  { value: 'log', label: 'Data log (CSV)' },
                ]}
                value={item.kind}
                onChange={(event) =>
                  update({ kind: event.target.value as EvidenceRequest['kind'] })
                }
              />
              <TextField
                label="What to capture"
                value={item.label}
                data-path={pathKey([...at, 'label'])}
                error={errorAt([...at, 'label'])}
                onChange={(event) => update({ label: event.target.value })}
              />
              <label className="flex min-h-touch items-center gap-3">
                <input
                  type="checkbox"
                  className="size-5 accent-primary"
                  checked={item.required}
                  onChange={(event) => update({ required: event.target.checked })}
                />
                <span>Required</span>
              </label>
            </ListRow>
          );
        })}
      </ListSection>
    </>
  );
}

export function NotesField({
  value,
  onChange,
  path,
  errorAt,
}: {
  value: string | undefined;
  onChange: (value: string | undefined) => void;
  path: Path;
  errorAt: ErrorAt;
}) {
  return (
    <TextAreaField
      label="Notes for the lead (optional)"
      hint="Why the step is there and where its thresholds come from."
      value={value ?? ''}
      data-path={pathKey([...path, 'notes'])}
      error={errorAt([...path, 'notes'])}
      onChange={(event) => onChange(event.target.value === '' ? undefined : event.target.value)}
    />
  );
}
