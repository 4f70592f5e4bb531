// A course: a title, what it is for, who takes it (one apprentice or every apprentice), and its
// training cases in order — added from the casebook, removed, and moved up or down.
import {
  courseRequestSchema,
  type StaffMember,
  type TrainingCaseSummary,
  type TrainingCourse,
} from '@heatpath/contracts';
import { useId, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldError, SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useSaveCourse } from '../api/save-course';
import { useOrderedIds } from '../hooks/use-ordered-ids';
import { difficultyText } from '../training-format';

type Field = 'title' | 'description' | 'apprenticeId' | 'trainingCaseIds';
type Errors = Partial<Record<Field, string>>;
const fields: readonly string[] = ['title', 'description', 'apprenticeId', 'trainingCaseIds'];

interface CourseFormProps {
  /** Absent for a new course. */
  course?: TrainingCourse | undefined;
  apprentices: readonly Pick<StaffMember, 'id' | 'name'>[];
  trainingCases: readonly TrainingCaseSummary[];
  onDone: (saved: TrainingCourse | null) => void;
}

export function CourseForm({ course, apprentices, trainingCases, onDone }: CourseFormProps) {
  const save = useSaveCourse();
  const [title, setTitle] = useState(course?.title ?? '');
  const [description, setDescription] = useState(course?.description ?? '');
  const [apprenticeId, setApprenticeId] = useState(course?.apprentice?.id ?? '');
  const items = useOrderedIds(course?.items.map((item) => item.trainingCaseId) ?? []);
  const [toAdd, setToAdd] = useState('');
  const [errors, setErrors] = useState<Errors>({});
  const headingId = useId();
  const listErrorId = useId();

  const byId = new Map(trainingCases.map((item) => [item.id, item]));
  // A course keeps a case the lead has since withdrawn; its name comes from the course itself.
  const known = new Map(course?.items.map((item) => [item.trainingCaseId, item]) ?? []);
  const addable = trainingCases.filter((item) => !item.withdrawn && !items.ids.includes(item.id));
  const chosenToAdd = addable.some((item) => item.id === toAdd) ? toAdd : (addable[0]?.id ?? '');

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = courseRequestSchema.safeParse({
      title,
      description: description.trim() === '' ? null : description,
      apprenticeId: apprenticeId === '' ? null : apprenticeId,
      trainingCaseIds: items.ids,
    });
    if (!parsed.success) {
      const next: Errors = {};
      for (const issue of parsed.error.issues) {
        const field = issue.path[0];
        if (typeof field === 'string' && fields.includes(field) && !next[field as Field])
          next[field as Field] = issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    save.mutate(
      { courseId: course?.id, course: parsed.data },
      {
        onSuccess: (saved) => onDone(saved),
        onError: (error) => {
          if (!isApiError(error)) return;
          const next: Errors = {};
          for (const [field, message] of Object.entries(error.fields))
            if (fields.includes(field)) next[field as Field] = message;
          setErrors(next);
        },
      },
    );
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby={headingId}
      className="flex flex-col gap-5 rounded-panel border-2 border-primary bg-surface p-4 sm:p-6"
    >
      <h3 id={headingId} className="text-xl font-bold">
        {course ? `Edit “${course.title}”` : 'New course'}
      </h3>
      {save.error ? (
        <Alert tone="danger" role="alert" title="Course not saved">
          <p>{save.error.message}</p>
        </Alert>
      ) : null}
      <div className="grid gap-5 lg:grid-cols-2">
        <TextField
          label="Course title"
          value={title}
          onChange={(event) => setTitle(event.target.value)}
          error={errors.title}
          autoComplete="off"
        />
        <SelectField
          label="For"
          value={apprenticeId}
          onChange={(event) => setApprenticeId(event.target.value)}
          error={errors.apprenticeId}
          options={[
            { value: '', label: 'Every apprentice' },
            ...apprentices.map((person) => ({ value: person.id, label: person.name })),
          ]}
        />
      </div>
      <TextAreaField
        label="Description (optional)"
        hint="What the course teaches, in a line or two."
        rows={2}
        value={description}
        onChange={(event) => setDescription(event.target.value)}
        error={errors.description}
      />

      <fieldset
        className="flex flex-col gap-3"
        aria-describedby={errors.trainingCaseIds ? listErrorId : undefined}
      >
        <legend className="mb-1 text-lg font-bold">Training cases, in order</legend>
        {items.ids.length === 0 ? (
          <p className="text-ink-muted">No case in the course yet. Add one below.</p>
        ) : (
          <ol aria-label="Cases in the course" className="flex flex-col gap-2">
            {items.ids.map((id, at) => {
              const item = byId.get(id);
              const symptom = item?.symptom ?? known.get(id)?.symptom ?? 'A training case';
              const difficulty = item?.difficulty ?? known.get(id)?.difficulty;
              const name = `${at + 1}. ${symptom}${item ? ` (${item.caseReference})` : ''}`;
              return (
                <li
                  key={id}
                  className="flex flex-col gap-2 rounded-control border-2 border-line-strong bg-canvas p-3 md:flex-row md:items-center md:justify-between"
                >
                  <span className="flex min-w-0 flex-col">
                    <span className="font-semibold">{name}</span>
                    <span className="text-sm text-ink-muted">
                      {difficulty ? difficultyText(difficulty) : ''}
                      {item?.withdrawn ? ' · withdrawn, apprentices do not see it' : ''}
                    </span>
                  </span>
                  <span className="flex shrink-0 flex-wrap gap-2">
                    <Button
                      variant="secondary"
                      disabled={at === 0}
                      onClick={() => items.move(id, -1)}
                      aria-label={`Move ${name} up`}
                    >
                      <span aria-hidden="true">↑</span> Up
                    </Button>
                    <Button
                      variant="secondary"
                      disabled={at === items.ids.length - 1}
                      onClick={() => items.move(id, 1)}
                      aria-label={`Move ${name} down`}
                    >
                      <span aria-hidden="true">↓</span> Down
                    </Button>
                    <Button
                      variant="danger"
                      onClick={() => items.remove(id)}
                      aria-label={`Remove ${name}`}
                    >
                      Remove
                    </Button>
                  </span>
                </li>
              );
            })}
          </ol>
        )}
        {errors.trainingCaseIds ? (
          <FieldError id={listErrorId} message={errors.trainingCaseIds} />
        ) : null}
        {addable.length > 0 ? (
          <div className="flex flex-col gap-3 md:flex-row md:items-end">
            <div className="min-w-0 flex-1">
              <SelectField
                label="Training case to add"
                value={chosenToAdd}
                onChange={(event) => setToAdd(event.target.value)}
                options={addable.map((item) => ({
                  value: item.id,
                  label: `${item.symptom} · ${item.caseReference} · ${difficultyText(item.difficulty)}`,
                }))}
              />
            </div>
            <Button
              variant="secondary"
              onClick={() => {
                if (!chosenToAdd) return;
                items.add(chosenToAdd);
                setToAdd('');
                setErrors((current) => ({ ...current, trainingCaseIds: undefined }));
              }}
            >
              Add to the course
            </Button>
          </div>
        ) : (
          <p className="text-sm text-ink-muted">
            {trainingCases.length === 0
              ? 'Mark a finished case for training first; then it can go into a course.'
              : 'Every training case is in this course.'}
          </p>
        )}
      </fieldset>

      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="large" busy={save.isPending} busyLabel="Saving…">
          {course ? 'Save course' : 'Create course'}
        </Button>
        <Button variant="secondary" size="large" onClick={() => onDone(null)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
