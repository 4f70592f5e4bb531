// Answers given on this tablet that the case could no longer take: it had moved on elsewhere
// (another device, another person) before they arrived. They are listed with two choices, and
// nothing typed is dropped either way: "Answer again" puts their readings back into the boxes of
// their steps; "Keep the case as it is" writes them into a note on the case.
import type { CompiledTree } from '@heatpath/fault-tree';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { discardOutboxItem, enqueueNote, useOutbox, type WalkItem } from '../../../lib/outbox';
import { describeItem } from '../outbox-words';
import { keepReadingsForStep } from '../undone-readings';

interface HeldAnswersProps {
  caseId: string;
  tree: CompiledTree | null;
  /** Shows the current step afresh, so its boxes take the readings put back. */
  onAnswerAgain: () => void;
}

export function HeldAnswers({ caseId, tree, onAnswerAgain }: HeldAnswersProps) {
  const items = useOutbox(caseId);
  const held = items.filter(
    (item): item is WalkItem => item.kind === 'walk' && item.state === 'held',
  );
  const [busy, setBusy] = useState(false);
  if (held.length === 0) return null;

  const settle = async (keep: (answers: readonly WalkItem[]) => Promise<void> | void) => {
    setBusy(true);
    try {
      await keep(held);
      for (const item of held) await discardOutboxItem(item.seq);
    } finally {
      setBusy(false);
    }
  };

  const answerAgain = async () => {
    await settle((answers) => {
      for (const { event } of answers) {
        if (event.type === 'answer.measurement') keepReadingsForStep(caseId, event);
      }
    });
    onAnswerAgain();
  };

  const keepAsItIs = () =>
    settle(async (answers) => {
      const lines = answers.map((item) => `• ${describeItem(item, tree)}`);
      await enqueueNote({
        caseId,
        nodeId: null,
        text: [
          'Answers given on a tablet and not stored, because the case had moved on:',
          ...lines,
        ].join('\n'),
      });
    });

  return (
    <section aria-label="Answers not stored: the case moved on">
      <Alert tone="caution" role="alert" title="The case moved on before these answers arrived">
        <p>
          The case was answered elsewhere meanwhile; it now shows where it stands. These answers
          from this tablet were not stored:
        </p>
        <ol className="list-decimal pl-6">
          {held.map((item) => (
            <li key={item.seq}>{describeItem(item, tree)}</li>
          ))}
        </ol>
        <div className="flex flex-wrap gap-3">
          <Button onClick={() => void answerAgain()} disabled={busy}>
            Answer again from where the case stands
          </Button>
          <Button variant="secondary" onClick={() => void keepAsItIs()} disabled={busy}>
            Keep the case as it is
          </Button>
        </div>
        <p className="text-sm text-ink-muted">
          Answering again fills in the readings you typed when you reach those steps. Keeping the
          case as it is writes these answers into a note on the case.
        </p>
      </Alert>
    </section>
  );
}
