// "Replay as it happened": the finished case one step at a time, every step revealed, with
// Previous and Next, to the finding, the findings and the teaching note. The position is in the
// address (?step=), so a reload or the back button keeps it.
import { useEffect, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useReplay } from '../api/get-replay';
import { TrainingCaseHeader } from './training-case-header';
import { TrainingStepView } from './training-step';
import { TeachingNote, TrainingOutcomeView } from './training-outcome';

interface ReplayViewerProps {
  trainingCaseId: string;
  /** 0-based; steps.length means the end (the outcome). */
  position: number;
  onMove: (position: number) => void;
}

export function ReplayViewer({ trainingCaseId, position, onMove }: ReplayViewerProps) {
  const replay = useReplay(trainingCaseId);
  const topRef = useRef<HTMLDivElement>(null);
  const moved = useRef(false);

  useEffect(() => {
    if (!moved.current) return;
    topRef.current?.scrollIntoView?.({ block: 'start' });
    topRef.current?.focus({ preventScroll: true });
  }, [position]);

  if (replay.isPending) return <LoadingState label="Loading the replay…" />;
  if (replay.isError)
    return (
      <ErrorState
        title="Replay not loaded"
        message={replay.error.message}
        onRetry={() => void replay.refetch()}
        retrying={replay.isRefetching}
      />
    );

  const { trainingCase, steps, outcome, findings, teachingNote } = replay.data;
  const last = steps.length;
  const at = Math.min(Math.max(0, position), last);
  const step = at < last ? steps[at] : undefined;
  const move = (next: number) => {
    moved.current = true;
    onMove(next);
  };

  return (
    <div className="flex flex-col gap-6">
      <TrainingCaseHeader title="Replay as it happened" entry={trainingCase} />
      <div ref={topRef} tabIndex={-1} className="flex flex-col gap-4 focus:outline-none">
        <p className="font-semibold" data-testid="replay-position">
          {step ? `Step ${at + 1} of ${last}` : `The finding, after ${last} steps`}
        </p>
        {/* A bar of the steps as well as the words, so the place in the case reads at a glance. */}
        <ol aria-hidden="true" className="flex gap-1">
          {[...steps, null].map((_, index) => (
            <li
              key={index}
              className={'h-2 flex-1 rounded-full ' + (index <= at ? 'bg-primary' : 'bg-sunken')}
            />
          ))}
        </ol>
        {step ? (
          <TrainingStepView step={step} revealed headingId="replay-step-heading" />
        ) : (
          <>
            <TrainingOutcomeView outcome={outcome} findings={findings} />
            <TeachingNote note={teachingNote} />
          </>
        )}
      </div>
      <nav aria-label="Replay steps" className="flex flex-wrap justify-between gap-3">
        <Button variant="secondary" size="large" disabled={at === 0} onClick={() => move(at - 1)}>
          <span aria-hidden="true">←</span> Previous
        </Button>
        <Button size="large" disabled={at === last} onClick={() => move(at + 1)}>
          {at === last - 1 ? 'Next: the finding' : 'Next'} <span aria-hidden="true">→</span>
        </Button>
      </nav>
    </div>
  );
}
