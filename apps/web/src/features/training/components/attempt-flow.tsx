// "Predict, then see": one scored attempt at a training case. The step waiting for a prediction
// is shown as the technician met it — cautions first, the answer or readings, the photos — with
// the question and its options; once predicted, the step is revealed with what really happened
// and why, and the next one follows. At the end: the score, the finding, the findings and the
// lead's teaching note, and "Try again".
import type { AttemptStep, PredictionResult, TrainingAttempt } from '@heatpath/contracts';
import { useEffect, useRef, useState } from 'react';
import { useNavigate } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import { Disclosure } from '../../../components/ui/disclosure';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useAttempt } from '../api/get-attempt';
import { useStartAttempt } from '../api/start-attempt';
import { useSubmitPrediction } from '../api/submit-prediction';
import { countText, scorePercent, scoreText } from '../training-format';
import { PredictionForm } from './prediction-form';
import { TrainingCaseHeader } from './training-case-header';
import { PredictionResultView } from './prediction-result';
import { StepOutcome, TrainingStepView } from './training-step';
import { TeachingNote, TrainingOutcomeView } from './training-outcome';

type PredictedStep = AttemptStep & { prediction: PredictionResult };

function isPredicted(entry: AttemptStep): entry is PredictedStep {
  return entry.prediction !== null;
}

function StepsSoFar({ steps }: { steps: readonly AttemptStep[] }) {
  return (
    <ol className="flex flex-col gap-3">
      {steps.map((entry) => (
        <li key={entry.step.index}>
          <TrainingStepView step={entry.step} revealed={false} level={3}>
            {isPredicted(entry) ? (
              <PredictionSummary entry={entry} />
            ) : (
              <div className="flex flex-col gap-2">
                <p className="text-ink-muted">
                  Nothing to predict here: the tree left only one way on.
                </p>
                <StepOutcome step={entry.step} />
              </div>
            )}
          </TrainingStepView>
        </li>
      ))}
    </ol>
  );
}

function PredictionSummary({ entry }: { entry: PredictedStep }) {
  const { prediction: result } = entry;
  const label = (id: string) => result.options.find((o) => o.id === id)?.label ?? id;
  return (
    <div className="flex flex-col gap-2">
      <p>
        <span className="font-bold">
          <span aria-hidden="true">{result.correct ? '✓ ' : '✕ '}</span>
          {result.correct ? 'Right' : 'Not what happened'} ({result.points} of {result.maxPoints}
          ):{' '}
        </span>
        you predicted “{label(result.chosenId)}”
        {result.correct ? '' : `; the right call was “${label(result.correctId)}”`}.
      </p>
      <StepOutcome step={entry.step} />
    </div>
  );
}

function ScorePanel({ attempt, onTryAgain }: { attempt: TrainingAttempt; onTryAgain: () => void }) {
  const predicted = attempt.steps.filter(isPredicted);
  const right = predicted.filter((entry) => entry.prediction.correct).length;
  const score = { score: attempt.score, maxScore: attempt.maxScore };
  return (
    <section
      aria-labelledby="score-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-primary bg-surface p-4 sm:p-6 lg:flex-row lg:items-center lg:justify-between"
    >
      <div className="flex flex-col gap-1">
        <h2 id="score-heading" className="text-xl font-bold">
          Your score
        </h2>
        <p className="text-figure font-bold whitespace-nowrap" data-testid="attempt-score">
          {scoreText(score)}
        </p>
        <p className="text-ink-muted">
          {scorePercent(score)} % · {right} of{' '}
          {countText(predicted.length, 'prediction', 'predictions')} right
        </p>
      </div>
      <div className="flex flex-wrap gap-3">
        <Button size="large" onClick={onTryAgain}>
          Try again
        </Button>
        <ButtonLink
          to={`/casebook/${encodeURIComponent(attempt.trainingCaseId)}/replay`}
          size="large"
        >
          Replay as it happened
        </ButtonLink>
        <ButtonLink to="/casebook" size="large" variant="quiet">
          Back to the casebook
        </ButtonLink>
      </div>
    </section>
  );
}

export function AttemptFlow({ attemptId }: { attemptId: string }) {
  const attempt = useAttempt(attemptId);
  const predict = useSubmitPrediction();
  const again = useStartAttempt();
  const navigate = useNavigate();
  const revealRef = useRef<HTMLHeadingElement>(null);
  const scoreRef = useRef<HTMLDivElement>(null);
  // Only a prediction made on this screen moves the view to its reveal; a reload stays put.
  const [revealedHere, setRevealedHere] = useState<number | null>(null);

  useEffect(() => {
    if (revealedHere === null) return;
    const target = attempt.data?.status === 'finished' ? scoreRef.current : revealRef.current;
    target?.scrollIntoView?.({ block: 'start' });
    if (target === revealRef.current) revealRef.current?.focus({ preventScroll: true });
  }, [revealedHere, attempt.data?.status]);

  if (attempt.isPending) return <LoadingState label="Loading the attempt…" />;
  if (attempt.isError)
    return (
      <ErrorState
        title="Attempt not loaded"
        message={attempt.error.message}
        onRetry={() => void attempt.refetch()}
        retrying={attempt.isRefetching}
      />
    );

  const data = attempt.data;
  const entry = data.trainingCase;
  const predicted = data.steps.filter(isPredicted);
  const lastPredicted = predicted.at(-1);
  const finished = data.status === 'finished';
  const tryAgain = () =>
    again.mutate(data.trainingCaseId, {
      onSuccess: (next) => void navigate(`/casebook/attempts/${encodeURIComponent(next.id)}`),
    });

  return (
    <div className="flex flex-col gap-6">
      <TrainingCaseHeader
        title="Predict, then see"
        entry={entry}
        status={
          finished
            ? 'Finished'
            : `Step ${data.current ? data.current.step.index + 1 : data.steps.length + 1} of ${entry.stepCount} · ${data.score} ${data.score === 1 ? 'point' : 'points'} so far`
        }
      />

      {again.error ? (
        <Alert tone="danger" role="alert" title="New attempt not started">
          <p>{again.error.message}</p>
        </Alert>
      ) : null}

      {finished ? (
        <div ref={scoreRef} className="flex flex-col gap-6">
          <ScorePanel attempt={data} onTryAgain={tryAgain} />
          {lastPredicted ? (
            <PredictionResultView entry={lastPredicted} headingId="reveal-heading" />
          ) : null}
          {data.teachingNote ? <TeachingNote note={data.teachingNote} /> : null}
          {data.outcome ? (
            <TrainingOutcomeView outcome={data.outcome} findings={data.findings} />
          ) : null}
          <Disclosure
            title="Every step and your predictions"
            summary={countText(data.steps.length, 'step', 'steps')}
          >
            <StepsSoFar steps={data.steps} />
          </Disclosure>
        </div>
      ) : (
        <>
          {lastPredicted ? (
            <PredictionResultView
              key={lastPredicted.step.index}
              entry={lastPredicted}
              headingId="reveal-heading"
              headingRef={revealRef}
            />
          ) : (
            <Alert tone="info" title="How this works">
              <p>
                At each step you see what the technician saw. Choose what should come next; then you
                see what really happened and why. Each right call scores points.
              </p>
            </Alert>
          )}
          {data.current ? (
            <TrainingStepView
              step={data.current.step}
              revealed={false}
              headingId="current-step-heading"
            >
              <PredictionForm
                key={data.current.step.index}
                ask={data.current.ask}
                busy={predict.isPending}
                error={predict.error?.message ?? null}
                onPredict={(optionId) => {
                  const index = data.current?.step.index ?? 0;
                  predict.mutate(
                    { attemptId: data.id, prediction: { index, optionId } },
                    { onSuccess: () => setRevealedHere(index) },
                  );
                }}
              />
            </TrainingStepView>
          ) : null}
          {data.steps.length > 0 ? (
            <Disclosure
              title="The steps so far"
              summary={countText(data.steps.length, 'step', 'steps')}
            >
              <StepsSoFar steps={data.steps} />
            </Disclosure>
          ) : null}
        </>
      )}
    </div>
  );
}
