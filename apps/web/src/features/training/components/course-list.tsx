// The lead's courses: each with who takes it and its cases in order, editable in place, and a
// form for a new one. The apprentices to choose from come from the staff list, which the route
// reads and passes in.
import type { StaffList, TrainingCourse } from '@heatpath/contracts';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCourses } from '../api/get-courses';
import { useTrainingCases } from '../api/get-training-cases';
import { countText, difficultyText, formatDate } from '../training-format';
import { CourseForm } from './course-form';

function CourseCard({ course, onEdit }: { course: TrainingCourse; onEdit: () => void }) {
  const headingId = `course-${course.id}`;
  return (
    <article
      aria-labelledby={headingId}
      className="flex flex-col gap-3 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="flex flex-col gap-0.5">
          <h3 id={headingId} className="text-lg font-bold">
            {course.title}
          </h3>
          <p className="text-ink-muted">
            For {course.apprentice ? course.apprentice.name : 'every apprentice'} ·{' '}
            {countText(course.items.length, 'case', 'cases')} · changed{' '}
            {formatDate(course.updatedAt)}
          </p>
        </div>
        <Button variant="secondary" onClick={onEdit}>
          Edit<span className="sr-only"> {course.title}</span>
        </Button>
      </div>
      {course.description ? <p className="whitespace-pre-line">{course.description}</p> : null}
      <ol className="flex list-decimal flex-col gap-1 pl-7">
        {course.items.map((item) => (
          <li key={item.trainingCaseId}>
            {item.symptom}{' '}
            <span className="text-ink-muted">· {difficultyText(item.difficulty)}</span>
          </li>
        ))}
      </ol>
    </article>
  );
}

interface CourseListProps {
  /** The workshop's people as read so far, and why they could not be read. */
  staff: { data?: StaffList; error: Error | null };
}

export function CourseList({ staff }: CourseListProps) {
  const courses = useCourses();
  const trainingCases = useTrainingCases();
  // 'new', a course id, or null when nothing is being edited.
  const [editing, setEditing] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);

  if (courses.isPending || trainingCases.isPending)
    return <LoadingState label="Loading courses…" />;
  if (courses.isError || trainingCases.isError) {
    const error = courses.error ?? trainingCases.error;
    return (
      <ErrorState
        title="Courses not loaded"
        message={error?.message ?? ''}
        onRetry={() => {
          void courses.refetch();
          void trainingCases.refetch();
        }}
        retrying={courses.isRefetching || trainingCases.isRefetching}
      />
    );
  }
  const apprentices =
    staff.data?.staff.filter((member) => member.role === 'apprentice' && member.active) ?? [];
  const done = (course: TrainingCourse | null) => {
    setEditing(null);
    setSaved(course ? `“${course.title}” is saved.` : null);
  };
  const form = (course?: TrainingCourse) => (
    <CourseForm
      course={course}
      apprentices={apprentices}
      trainingCases={trainingCases.data.trainingCases}
      onDone={done}
    />
  );

  return (
    <div className="flex flex-col gap-4">
      {staff.error ? (
        <Alert tone="caution" title="Apprentices not loaded">
          <p>{staff.error.message} A course can still be set for every apprentice.</p>
        </Alert>
      ) : null}
      {saved ? (
        <Alert tone="ok" role="status" title="Saved">
          <p>{saved}</p>
        </Alert>
      ) : null}
      {editing === 'new' ? (
        form()
      ) : (
        <div>
          <Button
            size="large"
            onClick={() => {
              setSaved(null);
              setEditing('new');
            }}
          >
            New course
          </Button>
        </div>
      )}
      {courses.data.courses.length === 0 && editing !== 'new' ? (
        <p className="text-ink-muted">
          No course yet. A course is an ordered set of training cases for one apprentice or for all
          of them.
        </p>
      ) : (
        <ul aria-label="Courses" className="flex flex-col gap-3">
          {courses.data.courses.map((course) => (
            <li key={course.id}>
              {editing === course.id ? (
                form(course)
              ) : (
                <CourseCard
                  course={course}
                  onEdit={() => {
                    setSaved(null);
                    setEditing(course.id);
                  }}
                />
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
