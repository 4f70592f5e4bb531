// Free notes on the case, each kept with the step it was written at, who wrote it and when, and
// the notes still in the outbox (given with an answer, or held answers kept as a note), marked as
// waiting. A note's idempotency key is made when it is first sent and reused if it has to be sent
// again.
import type { CaseNote } from '@heatpath/contracts';
import { useState } from 'react';
import { isPending, type NoteItem, type OutboxItem } from '../../../lib/outbox';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { useAddCaseNote } from '../api/add-case-note';
import { formatDateTime } from '../case-format';

interface CaseNotesProps {
  caseId: string;
  notes: readonly CaseNote[];
  /** The case's outbox: its notes are shown as waiting to be sent. */
  queued?: readonly OutboxItem[];
  /** The step a new note belongs to, and its title. */
  currentStep: { id: string; title: string };
  stepTitle: (nodeId: string) => string | null;
  canWrite: boolean;
}

export function CaseNotes({
  caseId,
  notes,
  queued = [],
  currentStep,
  stepTitle,
  canWrite,
}: CaseNotesProps) {
  const waiting = queued.filter(
    (item): item is NoteItem => item.kind === 'note' && isPending(item),
  );
  const add = useAddCaseNote();
  const [text, setText] = useState('');
  const [key, setKey] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);

  const send = () => {
    const trimmed = text.trim();
    if (!trimmed) {
      setProblem('Write the note first.');
      return;
    }
    setProblem(null);
    const idempotencyKey = key ?? crypto.randomUUID();
    setKey(idempotencyKey);
    add.mutate(
      { caseId, note: { idempotencyKey, nodeId: currentStep.id, text: trimmed } },
      {
        onSuccess: () => {
          setText('');
          setKey(null);
        },
      },
    );
  };

  return (
    <section
      aria-labelledby="notes-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="notes-heading" className="text-lg font-bold">
        Notes <span className="text-sm font-normal text-ink-muted">({notes.length})</span>
      </h2>
      {notes.length === 0 && waiting.length === 0 ? (
        <p className="text-ink-muted">No notes yet.</p>
      ) : null}
      {notes.length > 0 ? (
        <ul className="flex flex-col gap-3">
          {notes.map((note) => {
            const at = note.nodeId ? stepTitle(note.nodeId) : null;
            return (
              <li key={note.id} className="border-l-4 border-line-strong pl-3">
                <p className="whitespace-pre-line">{note.text}</p>
                <p className="text-sm text-ink-muted">
                  {note.author.name}, {formatDateTime(note.createdAt)}
                  {at ? ` · at “${at}”` : ''}
                </p>
              </li>
            );
          })}
        </ul>
      ) : null}
      {waiting.length > 0 ? (
        <ul className="flex flex-col gap-3" aria-label="Notes waiting to be sent">
          {waiting.map((note) => {
            const at = note.nodeId ? stepTitle(note.nodeId) : null;
            return (
              <li key={note.seq} className="border-l-4 border-dashed border-line-strong pl-3">
                <p className="whitespace-pre-line">{note.text}</p>
                <p className="text-sm text-ink-muted">Waiting to send{at ? ` · at “${at}”` : ''}</p>
              </li>
            );
          })}
        </ul>
      ) : null}
      {canWrite ? (
        <form
          noValidate
          aria-label="Add a note"
          className="flex flex-col gap-3"
          onSubmit={(event) => {
            event.preventDefault();
            send();
          }}
        >
          <TextAreaField
            label="Note"
            hint={`Kept with the step “${currentStep.title}”.`}
            rows={2}
            maxLength={4000}
            value={text}
            error={problem ?? undefined}
            onChange={(event) => {
              setText(event.target.value);
              // A changed note is a new note: it gets a new key when it is sent.
              if (!add.isPending) setKey(null);
            }}
          />
          {add.error ? (
            <Alert tone="danger" role="alert" title="Note not saved yet">
              <p>{add.error.message} The note is still here; press “Add note” to send it again.</p>
            </Alert>
          ) : null}
          <div>
            <Button type="submit" variant="secondary" busy={add.isPending} busyLabel="Saving note…">
              Add note
            </Button>
          </div>
        </form>
      ) : null}
    </section>
  );
}
