// A revealed prediction: what the learner chose, what the technician really did, the points, and
// the step's way on with the tree's reason. Right and wrong each carry a word and a mark.
import type { AttemptStep, PredictionResult } from '@heatpath/contracts';
import type { Ref } from 'react';
import { StepOutcome } from './training-step';

function optionLabel(result: PredictionResult, id: string): string {
  return result.options.find((option) => option.id === id)?.label ?? id;
}

export function PredictionResultView({
  entry,
  headingId,
  headingRef,
}: {
  entry: AttemptStep & { prediction: PredictionResult };
  headingId?: string;
  headingRef?: Ref<HTMLHeadingElement>;
}) {
  const { prediction: result, step } = entry;
  return (
    <section
      aria-labelledby={headingId}
      className={
        'flex flex-col gap-3 rounded-panel border-2 border-l-8 bg-surface p-4 sm:p-6 ' +
        (result.correct ? 'border-ok-line' : 'border-info-line')
      }
    >
      <h2
        id={headingId}
        ref={headingRef}
        tabIndex={-1}
        className="text-xl font-bold focus:outline-none"
      >
        What really happened: {step.title}
      </h2>
      <p
        className={
          'inline-flex w-fit items-center gap-2 rounded-full border-2 px-3 py-1 font-bold ' +
          (result.correct
            ? 'border-ok-line bg-ok-bg text-ok-ink'
            : 'border-info-line bg-info-bg text-info-ink')
        }
      >
        <span aria-hidden="true">{result.correct ? '✓' : '✕'}</span>
        {result.correct ? 'Right' : 'Not what happened'}
        <span className="font-semibold">
          · {result.points} of {result.maxPoints} {result.maxPoints === 1 ? 'point' : 'points'}
        </span>
      </p>
      <p className="text-ink-muted">{result.question}</p>
      <dl className="grid gap-x-4 gap-y-2 md:grid-cols-[11rem_minmax(0,1fr)]">
        <dt className="font-bold">You predicted</dt>
        <dd className="text-lg">{optionLabel(result, result.chosenId)}</dd>
        {result.correct ? null : (
          <>
            <dt className="font-bold">The right call</dt>
            <dd className="text-lg font-semibold">{optionLabel(result, result.correctId)}</dd>
          </>
        )}
      </dl>
      <StepOutcome step={step} />
    </section>
  );
}
