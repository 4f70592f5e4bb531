// An apprentice's progress in figures: cases reviewed, attempts, the average of their best
// scores, and the steps they got wrong most often. The lead's Progress and the apprentice's own
// "My progress" show the same figures.
import type { ApprenticeProgress, AttemptSummary } from '@heatpath/contracts';
import { Link } from 'react-router';
import { countText, formatWhen, scoreText } from '../training-format';

export function ProgressFigures({ progress }: { progress: ApprenticeProgress }) {
  return (
    <dl className="grid grid-cols-3 gap-3">
      <div className="rounded-control bg-sunken p-3">
        <dt className="text-sm text-ink-muted">Cases reviewed</dt>
        <dd className="text-xl font-bold">{progress.casesReviewed}</dd>
      </div>
      <div className="rounded-control bg-sunken p-3">
        <dt className="text-sm text-ink-muted">Attempts</dt>
        <dd className="text-xl font-bold">{progress.attempts}</dd>
      </div>
      <div className="rounded-control bg-sunken p-3">
        <dt className="text-sm text-ink-muted">Average score</dt>
        <dd className="text-xl font-bold">
          {progress.averageScorePercent === null
            ? '—'
            : `${Math.round(progress.averageScorePercent)} %`}
        </dd>
      </div>
    </dl>
  );
}

export function WeakSpots({
  progress,
  headingLevel = 3,
}: {
  progress: ApprenticeProgress;
  headingLevel?: 2 | 3 | 4;
}) {
  const Heading = `h${headingLevel}` as const;
  return (
    <div className="flex flex-col gap-2">
      <Heading className="text-lg font-bold">Where it went wrong most</Heading>
      {progress.weakSpots.length === 0 ? (
        <p className="text-ink-muted">No wrong predictions yet.</p>
      ) : (
        <ol className="flex flex-col gap-1">
          {progress.weakSpots.map((spot) => (
            <li key={spot.title} className="flex flex-wrap justify-between gap-x-3">
              <span className="font-semibold">{spot.title}</span>
              <span className="text-ink-muted">
                wrong {spot.wrong} of {countText(spot.asked, 'time', 'times')}
              </span>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}

export function AttemptHistory({
  history,
  linkAttempts,
  caption,
}: {
  history: readonly AttemptSummary[];
  /** The apprentice may open their own attempts again; the lead sees the list only. */
  linkAttempts: boolean;
  caption: string;
}) {
  if (history.length === 0) return <p className="text-ink-muted">No attempts yet.</p>;
  return (
    <ul aria-label={caption} className="flex flex-col divide-y-2 divide-line">
      {history.map((attempt) => {
        const result =
          attempt.status === 'finished'
            ? scoreText({ score: attempt.score, maxScore: attempt.maxScore })
            : 'Not finished';
        const body = (
          <>
            <span className="font-semibold">{attempt.symptom}</span>
            <span className="text-ink-muted">
              {formatWhen(attempt.finishedAt ?? attempt.startedAt)}
            </span>
            <span className="font-bold sm:text-right">{result}</span>
          </>
        );
        const classes =
          'grid min-h-touch items-center gap-x-4 gap-y-1 py-2 sm:grid-cols-[minmax(0,1fr)_auto_6rem]';
        return (
          <li key={attempt.id}>
            {linkAttempts ? (
              <Link
                to={`/casebook/attempts/${encodeURIComponent(attempt.id)}`}
                className={`${classes} rounded-control px-2 hover:bg-sunken`}
              >
                {body}
              </Link>
            ) : (
              <div className={classes}>{body}</div>
            )}
          </li>
        );
      })}
    </ul>
  );
}
