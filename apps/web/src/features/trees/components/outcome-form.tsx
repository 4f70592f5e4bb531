// The fields of a finding: root cause, correction, parts, labour and follow-ups — what goes into
// the repair order when a walk ends here.
import type { LabourLine, OutcomeNode, PartLine } from '@heatpath/fault-tree';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { pathKey } from '../draft-model';
import {
  ListRow,
  ListSection,
  NumberField,
  removeItem,
  replaceItem,
  TextList,
  type FormContext,
} from './editor-fields';

export function OutcomeFields({
  id,
  node,
  onChange,
  context,
}: {
  id: string;
  node: OutcomeNode;
  onChange: (patch: Partial<OutcomeNode>) => void;
  context: FormContext;
}) {
  const path = ['nodes', id] as const;
  const { errorAt } = context;
  const { parts, labour } = node;
  return (
    <>
      <TextAreaField
        label="Root cause"
        value={node.rootCause ?? ''}
        data-path={pathKey([...path, 'rootCause'])}
        error={errorAt([...path, 'rootCause'])}
        onChange={(event) => onChange({ rootCause: event.target.value })}
      />
      <TextAreaField
        label="Correction"
        rows={4}
        value={node.correction ?? ''}
        data-path={pathKey([...path, 'correction'])}
        error={errorAt([...path, 'correction'])}
        onChange={(event) => onChange({ correction: event.target.value })}
      />
      <ListSection
        title="Parts"
        addLabel="Add part"
        onAdd={() => onChange({ parts: [...parts, { description: '', quantity: 1 }] })}
      >
        {parts.map((part, index) => {
          const at = [...path, 'parts', index];
          const update = (patch: Partial<PartLine>) =>
            onChange({ parts: replaceItem(parts, index, { ...part, ...patch }) });
          return (
            <ListRow
              key={index}
              legend={`Part ${index + 1}`}
              onRemove={() => onChange({ parts: removeItem(parts, index) })}
            >
              <TextField
                label="Part"
                value={part.description}
                data-path={pathKey([...at, 'description'])}
                error={errorAt([...at, 'description'])}
                onChange={(event) => update({ description: event.target.value })}
              />
              <NumberField
                label="Quantity"
                value={part.quantity}
                path={[...at, 'quantity']}
                errorAt={errorAt}
                onChange={(quantity) => update({ quantity: quantity as number })}
              />
            </ListRow>
          );
        })}
      </ListSection>
      <ListSection
        title="Labour"
        addLabel="Add labour line"
        onAdd={() => onChange({ labour: [...labour, { operation: '', hours: 0.5 }] })}
      >
        {labour.map((line, index) => {
          const at = [...path, 'labour', index];
          const update = (patch: Partial<LabourLine>) =>
            onChange({ labour: replaceItem(labour, index, { ...line, ...patch }) });
          return (
            <ListRow
              key={index}
              legend={`Labour ${index + 1}`}
              onRemove={() => onChange({ labour: removeItem(labour, index) })}
            >
              <TextField
                label="Operation"
                value={line.operation}
                data-path={pathKey([...at, 'operation'])}
                error={errorAt([...at, 'operation'])}
                onChange={(event) => update({ operation: event.target.value })}
              />
              <NumberField
                label="Hours"
                value={line.hours}
                suffix="h"
                path={[...at, 'hours']}
                errorAt={errorAt}
                onChange={(hours) => update({ hours: hours as number })}
              />
            </ListRow>
          );
        })}
      </ListSection>
      <TextList
        title="Follow-ups"
        hint="For example: drive to full operating temperature for ten minutes or more, let it cool, recheck the level."
        itemLabel={(index) => `Follow-up ${index + 1}`}
        addLabel="Add follow-up"
        items={node.followUps}
        onChange={(followUps) => onChange({ followUps })}
        path={[...path, 'followUps']}
        errorAt={errorAt}
      />
    </>
  );
}
