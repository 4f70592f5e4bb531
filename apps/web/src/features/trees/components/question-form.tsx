// The fields of a question: what to ask, and its answers, each leading to a step.
import type { Choice, QuestionNode } from '@heatpath/fault-tree';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { pathKey, uniqueId } from '../draft-model';
import {
  ListRow,
  ListSection,
  moveItem,
  removeItem,
  replaceItem,
  TargetSelect,
  type FormContext,
} from './editor-fields';

export function QuestionFields({
  id,
  node,
  onChange,
  context,
}: {
  id: string;
  node: QuestionNode;
  onChange: (patch: Partial<QuestionNode>) => void;
  context: FormContext;
}) {
  const path = ['nodes', id] as const;
  const { errorAt, options } = context;
  const choices = node.choices;
  const updateChoice = (index: number, patch: Partial<Choice>, choice: Choice) =>
    onChange({ choices: replaceItem(choices, index, { ...choice, ...patch }) });
  return (
    <>
      <TextAreaField
        label="Question to ask"
        value={node.prompt ?? ''}
        data-path={pathKey([...path, 'prompt'])}
        error={errorAt([...path, 'prompt'])}
        onChange={(event) => onChange({ prompt: event.target.value })}
      />
      <ListSection
        title="Answers"
        hint="The technician taps one; the walk goes on to the step it leads to."
        addLabel="Add answer"
        error={errorAt([...path, 'choices'])}
        onAdd={() =>
          onChange({
            choices: [
              ...choices,
              {
                id: uniqueId('answer', new Set(choices.map((choice) => choice.id))),
                label: '',
                to: '',
              },
            ],
          })
        }
      >
        {choices.map((choice, index) => {
          const at = [...path, 'choices', index];
          const legend = `Answer ${index + 1}${choice.label ? `: ${choice.label}` : ''}`;
          return (
            <ListRow
              key={choice.id || index}
              legend={legend}
              onRemove={() => onChange({ choices: removeItem(choices, index) })}
              onMoveUp={
                index > 0
                  ? () => onChange({ choices: moveItem(choices, index, index - 1) })
                  : undefined
              }
            >
              <TextField
                label="Answer text"
                value={choice.label}
                data-path={pathKey([...at, 'label'])}
                error={errorAt([...at, 'label']) ?? errorAt([...at, 'id'])}
                onChange={(event) => updateChoice(index, { label: event.target.value }, choice)}
              />
              <TargetSelect
                label="Leads to"
                value={choice.to}
                options={options}
                exclude={id}
                path={[...at, 'to']}
                errorAt={errorAt}
                setAt={context.setAt}
              />
              <TextField
                label="Hint (optional)"
                value={choice.hint ?? ''}
                data-path={pathKey([...at, 'hint'])}
                error={errorAt([...at, 'hint'])}
                onChange={(event) =>
                  updateChoice(index, { hint: event.target.value || undefined }, choice)
                }
              />
            </ListRow>
          );
        })}
      </ListSection>
    </>
  );
}
