// The form for the selected step: its title, the fields of its kind, and the fields every step
// shares. Deleting asks first, and the first step cannot be deleted until another one starts.
import type {
  MeasurementNode,
  OutcomeNode,
  ProcedureNode,
  QuestionNode,
  StepNode,
  TreeNode,
} from '@heatpath/fault-tree';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { stepKindLabels as kindLabels } from '../../../lib/step-labels';
import { pathKey } from '../draft-model';
import type { FormContext } from './editor-fields';
import { MeasurementFields } from './measurement-step-form';
import { OutcomeFields } from './outcome-form';
import { ProcedureFields } from './procedure-form';
import { QuestionFields } from './question-form';
import { NotesField, SafetyFields, StepExtras } from './step-fields';

interface NodeFormProps {
  id: string;
  node: TreeNode;
  isStart: boolean;
  /** How many ways on from other steps lead here (shown before deleting). */
  incoming: number;
  problemCount: number;
  onChange: (node: TreeNode) => void;
  onDelete: () => void;
  onMakeStart: () => void;
  context: FormContext;
}

export function NodeForm({
  id,
  node,
  isStart,
  incoming,
  problemCount,
  onChange,
  onDelete,
  onMakeStart,
  context,
}: NodeFormProps) {
  const [confirming, setConfirming] = useState(false);
  const path = ['nodes', id] as const;
  const { errorAt } = context;
  const patch = (changes: Partial<TreeNode>) => onChange({ ...node, ...changes } as TreeNode);
  const known = node.kind in kindLabels;

  return (
    <form
      aria-label={`Edit “${node.title || id}”`}
      tabIndex={-1}
      className="flex flex-col gap-5 focus-visible:outline-none"
      onSubmit={(event) => event.preventDefault()}
    >
      <div className="flex flex-wrap items-center gap-2">
        <Badge>{known ? kindLabels[node.kind] : `Unknown kind “${String(node.kind)}”`}</Badge>
        {isStart ? <Badge tone="ok">First step</Badge> : null}
        {problemCount > 0 ? (
          <Badge tone="danger">
            <span aria-hidden="true">✕&nbsp;</span>
            {problemCount === 1 ? '1 problem' : `${problemCount} problems`}
          </Badge>
        ) : null}
        <span className="text-sm text-ink-muted">
          id <code className="font-mono">{id}</code>
        </span>
      </div>
      <TextField
        label="Title"
        value={node.title ?? ''}
        data-path={pathKey([...path, 'title'])}
        error={errorAt([...path, 'title'])}
        onChange={(event) => patch({ title: event.target.value })}
      />

      {node.kind === 'question' ? (
        <QuestionFields id={id} node={node} context={context} onChange={(c) => patch(c)} />
      ) : node.kind === 'measurement' ? (
        <MeasurementFields
          id={id}
          node={node as MeasurementNode}
          context={context}
          onChange={(c) => patch(c)}
        />
      ) : node.kind === 'procedure' ? (
        <ProcedureFields
          id={id}
          node={node as ProcedureNode}
          context={context}
          onChange={(c) => patch(c)}
        />
      ) : node.kind === 'outcome' ? (
        <OutcomeFields
          id={id}
          node={node as OutcomeNode}
          context={context}
          onChange={(c) => patch(c)}
        />
      ) : (
        <Alert tone="danger" title="This step cannot be edited here">
          <p>Its kind is not one Heatpath knows. Delete it, or fix the file and import it again.</p>
        </Alert>
      )}

      {node.kind === 'question' || node.kind === 'measurement' || node.kind === 'procedure' ? (
        <StepExtras
          node={node as StepNode}
          path={path}
          errorAt={errorAt}
          onChange={(c) => patch(c as Partial<QuestionNode>)}
        />
      ) : null}
      {known ? (
        <>
          <SafetyFields
            hazards={node.hazards}
            cautions={node.cautions}
            path={path}
            errorAt={errorAt}
            onChange={(c) => patch(c)}
          />
          <NotesField
            value={node.notes}
            path={path}
            errorAt={errorAt}
            onChange={(notes) => patch({ notes })}
          />
        </>
      ) : null}

      <div className="flex flex-col gap-3 border-t-2 border-line pt-4">
        {!isStart ? (
          <div>
            <Button variant="secondary" onClick={onMakeStart}>
              Make this the first step
            </Button>
          </div>
        ) : null}
        {confirming ? (
          <Alert tone="caution" title={`Delete “${node.title || id}”?`} role="alert">
            <p>
              {incoming > 0
                ? `${incoming} way${incoming === 1 ? '' : 's'} on lead${incoming === 1 ? 's' : ''} here; each will need another step.`
                : 'No other step leads here.'}
            </p>
            <div className="flex flex-wrap gap-3">
              <Button variant="danger" onClick={onDelete}>
                Yes, delete this step
              </Button>
              <Button variant="secondary" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </div>
          </Alert>
        ) : (
          <div>
            <Button
              variant="danger"
              disabled={isStart}
              onClick={() => setConfirming(true)}
              aria-describedby={isStart ? `${id}-start-note` : undefined}
            >
              Delete step
            </Button>
            {isStart ? (
              <p id={`${id}-start-note`} className="mt-2 text-sm text-ink-muted">
                The first step cannot be deleted; make another step the first one first.
              </p>
            ) : null}
          </div>
        )}
      </div>
    </form>
  );
}
