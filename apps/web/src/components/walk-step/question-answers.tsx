// A question's choices as large buttons, one tap each; the button is named by the choice alone,
// with its hint read as a description. The feature decides what an answer does (the case page
// sends it; Try it applies it in the browser). While the step cannot be answered yet (a required
// photo is missing) the buttons are disabled and say why.
import type { QuestionNode, WalkEvent } from '@heatpath/fault-tree';
import { useId } from 'react';
import { BlockedReason } from './blocked-reason';

interface QuestionAnswersProps {
  node: QuestionNode & { id: string };
  position: number;
  disabled?: boolean;
  /** The choice waiting to be stored, marked while it is sent. */
  pendingChoiceId?: string | null;
  /** Why the step cannot be answered yet; the buttons are disabled while it is set. */
  blockedReason?: string | null;
  onAnswer: (event: WalkEvent, label: string) => void;
}

export function QuestionAnswers({
  node,
  position,
  disabled = false,
  pendingChoiceId = null,
  blockedReason = null,
  onAnswer,
}: QuestionAnswersProps) {
  const baseId = useId();
  const reasonId = `${baseId}-blocked`;
  return (
    <div role="group" aria-label="Answers" className="grid gap-3">
      {blockedReason ? <BlockedReason id={reasonId} reason={blockedReason} /> : null}
      {node.choices.map((choice, index) => {
        const labelId = `${baseId}-${index}-label`;
        const hintId = `${baseId}-${index}-hint`;
        const chosen = pendingChoiceId === choice.id;
        return (
          <button
            key={choice.id}
            type="button"
            disabled={disabled || Boolean(blockedReason)}
            aria-labelledby={labelId}
            aria-describedby={
              [choice.hint ? hintId : null, blockedReason ? reasonId : null]
                .filter(Boolean)
                .join(' ') || undefined
            }
            onClick={() =>
              onAnswer(
                { type: 'answer.choice', nodeId: node.id, position, choiceId: choice.id },
                choice.label,
              )
            }
            className={
              'flex min-h-touch-lg w-full flex-col items-start justify-center gap-1 rounded-control border-2 px-5 py-3 ' +
              'text-left text-lg font-semibold select-none disabled:cursor-not-allowed ' +
              (chosen
                ? 'border-primary bg-primary text-on-primary'
                : 'border-line-strong bg-surface text-ink hover:bg-sunken disabled:opacity-60')
            }
          >
            <span id={labelId} className="flex items-center gap-2">
              {chosen ? <span aria-hidden="true">✓</span> : null}
              {choice.label}
            </span>
            {choice.hint ? (
              <span id={hintId} className="text-sm font-normal">
                {choice.hint}
              </span>
            ) : null}
          </button>
        );
      })}
    </div>
  );
}
