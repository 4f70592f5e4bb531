// The apprentice's casebook: their courses (in the lead's order, with whether each is signed off)
// and every training case open to them.
import type { Casebook, CasebookCourse, CasebookEntry } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCasebook } from '../api/get-casebook';
import { countText, formatDate } from '../training-format';
import { CasebookCard } from './casebook-card';

function CourseSection({ course, cases }: { course: CasebookCourse; cases: Casebook['cases'] }) {
  const byId = new Map(cases.map((entry) => [entry.id, entry]));
  const entries = course.trainingCaseIds
    .map((id) => byId.get(id))
    .filter((entry): entry is CasebookEntry => entry !== undefined);
  const done = entries.filter((entry) => entry.bestScore !== null).length;
  const headingId = `course-${course.id}`;
  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-2">
        <h3 id={headingId} className="text-xl font-bold">
          {course.title}
        </h3>
        {course.signOff ? (
          <p className="font-semibold text-ok-ink">
            <span aria-hidden="true">✓ </span>Signed off {formatDate(course.signOff.signedAt)} by{' '}
            {course.signOff.signedBy.name}
          </p>
        ) : (
          <p className="font-semibold text-ink-muted">
            {done} of {countText(entries.length, 'case', 'cases')} finished · not signed off yet
          </p>
        )}
      </div>
      {course.description ? <p className="whitespace-pre-line">{course.description}</p> : null}
      {course.signOff?.note ? (
        <p className="text-ink-muted">
          <span className="font-semibold">The lead’s note: </span>
          {course.signOff.note}
        </p>
      ) : null}
      <ol className="grid grid-cols-[repeat(auto-fill,minmax(min(100%,20rem),1fr))] gap-3">
        {entries.map((entry, at) => (
          <li key={entry.id}>
            <CasebookCard entry={entry} position={at + 1} />
          </li>
        ))}
      </ol>
    </section>
  );
}

export function CasebookOverview() {
  const casebook = useCasebook();
  if (casebook.isPending) return <LoadingState label="Loading the casebook…" />;
  if (casebook.isError)
    return (
      <ErrorState
        title="Casebook not loaded"
        message={casebook.error.message}
        onRetry={() => void casebook.refetch()}
        retrying={casebook.isRefetching}
      />
    );
  const { courses, cases } = casebook.data;
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="courses-heading" className="flex flex-col gap-3">
        <h2 id="courses-heading" className="text-xl font-bold">
          Your courses
        </h2>
        {courses.length === 0 ? (
          <p className="text-ink-muted">
            No course is set for you yet. The cases below are open to you all the same.
          </p>
        ) : (
          courses.map((course) => <CourseSection key={course.id} course={course} cases={cases} />)
        )}
      </section>
      <section aria-labelledby="cases-heading" className="flex flex-col gap-3">
        <h2 id="cases-heading" className="text-xl font-bold">
          Every training case
        </h2>
        {cases.length === 0 ? (
          <Alert tone="info" title="No training cases yet">
            <p>The lead has not chosen any finished case for training yet.</p>
          </Alert>
        ) : (
          <ul className="grid grid-cols-[repeat(auto-fill,minmax(min(100%,20rem),1fr))] gap-3">
            {cases.map((entry) => (
              <li key={entry.id}>
                <CasebookCard entry={entry} />
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
