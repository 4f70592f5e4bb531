// The fields of a procedure: the instruction and its two ways on, "Done" and "Could not do".
import type { ProcedureNode } from '@heatpath/fault-tree';
import { TextAreaField } from '../../../components/ui/field';
import { pathKey } from '../draft-model';
import { TargetSelect, type FormContext } from './editor-fields';

export function ProcedureFields({
  id,
  node,
  onChange,
  context,
}: {
  id: string;
  node: ProcedureNode;
  onChange: (patch: Partial<ProcedureNode>) => void;
  context: FormContext;
}) {
  const path = ['nodes', id] as const;
  const { errorAt, options } = context;
  return (
    <>
      <TextAreaField
        label="Instruction"
        rows={4}
        value={node.instruction ?? ''}
        data-path={pathKey([...path, 'instruction'])}
        error={errorAt([...path, 'instruction'])}
        onChange={(event) => onChange({ instruction: event.target.value })}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TargetSelect
          label="“Done” leads to"
          value={node.done}
          options={options}
          exclude={id}
          path={[...path, 'done']}
          errorAt={errorAt}
          setAt={context.setAt}
          removeWhenEmpty
        />
        <TargetSelect
          label="“Could not do” leads to"
          value={node.couldNotDo}
          options={options}
          exclude={id}
          path={[...path, 'couldNotDo']}
          errorAt={errorAt}
          setAt={context.setAt}
          removeWhenEmpty
        />
      </div>
    </>
  );
}
