// The lead's view of each apprentice: cases reviewed, attempts, average score, where they went
// wrong most, every attempt (on demand), and each course's progress with "Sign off as complete".
import type { ApprenticeProgress, CourseProgress, PersonRef } from '@heatpath/contracts';
import { useId, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Disclosure } from '../../../components/ui/disclosure';
import { TextAreaField } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useApprenticeProgress, useProgress } from '../api/get-progress';
import { useSignOffCourse } from '../api/sign-off-course';
import { formatDate } from '../training-format';
import { AttemptHistory, ProgressFigures, WeakSpots } from './progress-summary';

function SignOffControl({ course, apprentice }: { course: CourseProgress; apprentice: PersonRef }) {
  const [open, setOpen] = useState(false);
  const [note, setNote] = useState('');
  const signOff = useSignOffCourse();
  const noteId = useId();

  if (course.signOff)
    return (
      <p className="font-semibold text-ok-ink">
        <span aria-hidden="true">✓ </span>Signed off {formatDate(course.signOff.signedAt)} by{' '}
        {course.signOff.signedBy.name}
        {course.signOff.note ? (
          <span className="block font-normal text-ink-muted">“{course.signOff.note}”</span>
        ) : null}
      </p>
    );
  if (!open)
    return (
      <Button
        variant="secondary"
        onClick={() => setOpen(true)}
        aria-label={`Sign off as complete: ${course.title}`}
      >
        Sign off as complete
      </Button>
    );
  const incomplete = course.completedCases < course.totalCases;
  return (
    <div className="flex flex-col gap-3 rounded-control border-2 border-line-strong bg-canvas p-3">
      <p className="font-semibold">
        Sign off “{course.title}” for {apprentice.name}? It is recorded with today’s date and your
        name.
      </p>
      {incomplete ? (
        <p>
          {apprentice.name} has finished {course.completedCases} of {course.totalCases} cases in
          this course.
        </p>
      ) : null}
      <TextAreaField
        id={noteId}
        label="Note for the record (optional)"
        rows={2}
        value={note}
        onChange={(event) => setNote(event.target.value)}
      />
      {signOff.error ? (
        <Alert tone="danger" role="alert" title="Not signed off">
          <p>{signOff.error.message}</p>
        </Alert>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Button
          busy={signOff.isPending}
          busyLabel="Signing off…"
          onClick={() =>
            signOff.mutate({
              courseId: course.id,
              signOff: { apprenticeId: apprentice.id, note: note.trim() === '' ? null : note },
            })
          }
        >
          Yes, sign off {incomplete ? 'anyway' : 'as complete'}
        </Button>
        <Button variant="secondary" onClick={() => setOpen(false)}>
          Not yet
        </Button>
      </div>
    </div>
  );
}

function ApprenticeHistory({ apprentice }: { apprentice: PersonRef }) {
  const detail = useApprenticeProgress(apprentice.id);
  if (detail.isPending) return <LoadingState label="Loading attempts…" />;
  if (detail.isError)
    return (
      <ErrorState
        title="Attempts not loaded"
        message={detail.error.message}
        onRetry={() => void detail.refetch()}
        retrying={detail.isRefetching}
      />
    );
  return (
    <AttemptHistory
      history={detail.data.history}
      linkAttempts={false}
      caption={`Attempts of ${apprentice.name}`}
    />
  );
}

function ApprenticeCard({ progress }: { progress: ApprenticeProgress }) {
  const headingId = `apprentice-${progress.apprentice.id}`;
  return (
    <article
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
    >
      <h2 id={headingId} className="text-xl font-bold">
        {progress.apprentice.name}
      </h2>
      <ProgressFigures progress={progress} />
      <div className="grid gap-6 lg:grid-cols-2">
        <WeakSpots progress={progress} />
        <div className="flex flex-col gap-3">
          <h3 className="text-lg font-bold">Courses</h3>
          {progress.courses.length === 0 ? (
            <p className="text-ink-muted">No course is set for {progress.apprentice.name}.</p>
          ) : (
            <ul className="flex flex-col gap-4">
              {progress.courses.map((course) => (
                <li key={course.id} className="flex flex-col gap-2">
                  <span className="flex flex-wrap justify-between gap-x-3">
                    <span className="font-semibold">{course.title}</span>
                    <span className="text-ink-muted">
                      {course.completedCases} of {course.totalCases} cases finished
                    </span>
                  </span>
                  <div>
                    <SignOffControl course={course} apprentice={progress.apprentice} />
                  </div>
                </li>
              ))}
            </ul>
          )}
        </div>
      </div>
      <Disclosure title="Every attempt" summary={`${progress.attempts} in all`}>
        <ApprenticeHistory apprentice={progress.apprentice} />
      </Disclosure>
    </article>
  );
}

export function ProgressBoard() {
  const progress = useProgress();
  if (progress.isPending) return <LoadingState label="Loading progress…" />;
  if (progress.isError)
    return (
      <ErrorState
        title="Progress not loaded"
        message={progress.error.message}
        onRetry={() => void progress.refetch()}
        retrying={progress.isRefetching}
      />
    );
  if (progress.data.apprentices.length === 0)
    return <p className="text-ink-muted">The workshop has no apprentices.</p>;
  return (
    <ul aria-label="Apprentices" className="flex flex-col gap-4">
      {progress.data.apprentices.map((item) => (
        <li key={item.apprentice.id}>
          <ApprenticeCard progress={item} />
        </li>
      ))}
    </ul>
  );
}
