// A procedure's two answers, "Done" and "Could not do", with an optional note that is stored on
// the step with the answer (where the feature keeps notes). The feature decides what an answer does.
// While the step cannot be answered yet (a required photo is missing) the two answers are disabled
// and say why; the note can still be written.
import type { ProcedureNode, ProcedureResult, WalkEvent } from '@heatpath/fault-tree';
import { useId, useState } from 'react';
import { Button } from '../ui/button';
import { TextAreaField } from '../ui/field';
import { BlockedReason } from './blocked-reason';

interface ProcedureAnswersProps {
  node: ProcedureNode & { id: string };
  position: number;
  disabled?: boolean;
  pendingResult?: ProcedureResult | null;
  /** Offer "Add a note"; off where nothing keeps it (Try it). */
  withNote?: boolean;
  /** Why the step cannot be answered yet; "Done" and "Could not do" are disabled while it is set. */
  blockedReason?: string | null;
  onAnswer: (event: WalkEvent, label: string, note?: string) => void;
}

export function ProcedureAnswers({
  node,
  position,
  disabled = false,
  pendingResult = null,
  withNote = true,
  blockedReason = null,
  onAnswer,
}: ProcedureAnswersProps) {
  const reasonId = useId();
  const answerDisabled = disabled || Boolean(blockedReason);
  const describedBy = blockedReason ? reasonId : undefined;
  const [note, setNote] = useState('');
  // Folded until wanted, so the two answers stay in view beside a long instruction.
  const [writing, setWriting] = useState(false);
  const send = (result: ProcedureResult, label: string) =>
    onAnswer({ type: 'answer.procedure', nodeId: node.id, position, result }, label, note);
  return (
    <div className="flex flex-col gap-4">
      {blockedReason ? <BlockedReason id={reasonId} reason={blockedReason} /> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        {node.done ? (
          <Button
            size="large"
            disabled={answerDisabled}
            aria-describedby={describedBy}
            onClick={() => send('done', 'Done')}
            busy={pendingResult === 'done'}
            busyLabel="Saving “Done”…"
          >
            Done
          </Button>
        ) : null}
        {node.couldNotDo ? (
          <Button
            size="large"
            variant="secondary"
            disabled={answerDisabled}
            aria-describedby={describedBy}
            onClick={() => send('could-not-do', 'Could not do')}
            busy={pendingResult === 'could-not-do'}
            busyLabel="Saving “Could not do”…"
          >
            Could not do
          </Button>
        ) : null}
      </div>
      {!withNote ? null : writing ? (
        <TextAreaField
          label="Note on this step (optional)"
          hint="What you found, or why it could not be done. Saved with your answer."
          rows={2}
          value={note}
          maxLength={4000}
          disabled={disabled}
          autoFocus
          onChange={(event) => setNote(event.target.value)}
        />
      ) : (
        <div>
          <Button variant="secondary" disabled={disabled} onClick={() => setWriting(true)}>
            Add a note
          </Button>
        </div>
      )}
    </div>
  );
}
