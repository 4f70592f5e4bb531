// "My progress": the apprentice's own figures, their courses with sign-off, and every attempt
// (each opens again to look back through it). Never anyone else's scores.
import { Panel } from '../../../components/ui/page';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useMyProgress } from '../api/get-my-progress';
import { formatDate } from '../training-format';
import { AttemptHistory, ProgressFigures, WeakSpots } from './progress-summary';

export function MyProgress() {
  const progress = useMyProgress();
  if (progress.isPending) return <LoadingState label="Loading your progress…" />;
  if (progress.isError)
    return (
      <ErrorState
        title="Progress not loaded"
        message={progress.error.message}
        onRetry={() => void progress.refetch()}
        retrying={progress.isRefetching}
      />
    );
  const data = progress.data;
  return (
    <div className="flex flex-col gap-6">
      <ProgressFigures progress={data} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel labelledBy="my-courses-heading">
          <h2 id="my-courses-heading" className="mb-3 text-xl font-bold">
            Courses
          </h2>
          {data.courses.length === 0 ? (
            <p className="text-ink-muted">No course is set for you yet.</p>
          ) : (
            <ul className="flex flex-col gap-3">
              {data.courses.map((course) => (
                <li key={course.id} className="flex flex-col gap-1">
                  <span className="font-semibold">{course.title}</span>
                  <span className="text-ink-muted">
                    {course.completedCases} of {course.totalCases} cases finished
                  </span>
                  {course.signOff ? (
                    <span className="font-semibold text-ok-ink">
                      <span aria-hidden="true">✓ </span>Signed off{' '}
                      {formatDate(course.signOff.signedAt)} by {course.signOff.signedBy.name}
                    </span>
                  ) : (
                    <span className="text-ink-muted">Not signed off yet</span>
                  )}
                </li>
              ))}
            </ul>
          )}
        </Panel>
        <Panel>
          <WeakSpots progress={data} headingLevel={2} />
        </Panel>
      </div>
      <Panel labelledBy="my-attempts-heading">
        <h2 id="my-attempts-heading" className="mb-3 text-xl font-bold">
          Your attempts
        </h2>
        <AttemptHistory history={data.history} linkAttempts caption="Your attempts" />
      </Panel>
    </div>
  );
}
