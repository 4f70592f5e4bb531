// The advisor's edit of a diagnosed case's findings: concern, cause, correction, the parts and
// labour lines, follow-ups, and which photos go into the repair order. Saving makes a new
// revision against the one that was opened, so two people never overwrite each other unknowingly.
import {
  updateFindingsRequestSchema,
  findingsPhotoLimit,
  type FindingsRevision,
  type RepairOrderPhoto,
} from '@heatpath/contracts';
import { useEffect } from 'react';
import { useFieldArray, useForm, useWatch, type Path } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useSaveFindingsRevision } from '../api/save-findings-revision';
import { readNumber } from '../format';
import { PhotoPicker } from './photo-picker';

interface FormValues {
  concern: string;
  cause: string;
  correction: string;
  parts: { description: string; quantity: string; partNumber: string }[];
  labour: { operation: string; hours: string }[];
  followUps: { text: string }[];
  photoIds: string[];
}

function toValues(f: FindingsRevision): FormValues {
  return {
    concern: f.concern,
    cause: f.cause,
    correction: f.correction,
    parts: f.parts.map((p) => ({
      description: p.description,
      quantity: String(p.quantity),
      partNumber: p.partNumber ?? '',
    })),
    labour: f.labour.map((l) => ({ operation: l.operation, hours: String(l.hours) })),
    followUps: f.followUps.map((text) => ({ text })),
    photoIds: f.photoIds,
  };
}

interface FindingsReviewFormProps {
  caseId: string;
  current: FindingsRevision;
  photos: readonly RepairOrderPhoto[];
  onDirtyChange: (dirty: boolean) => void;
  onReload: () => void;
}

export function FindingsReviewForm({
  caseId,
  current,
  photos,
  onDirtyChange,
  onReload,
}: FindingsReviewFormProps) {
  const save = useSaveFindingsRevision();
  const form = useForm<FormValues>({ defaultValues: toValues(current) });
  const { errors, isDirty } = form.formState;
  const parts = useFieldArray({ control: form.control, name: 'parts' });
  const labour = useFieldArray({ control: form.control, name: 'labour' });
  const followUps = useFieldArray({ control: form.control, name: 'followUps' });
  const photoIds = useWatch({ control: form.control, name: 'photoIds' });
  const conflict = isApiError(save.error) && save.error.status === 409;

  useEffect(() => onDirtyChange(isDirty), [isDirty, onDirtyChange]);

  const submit = form.handleSubmit((values) => {
    const request = {
      revision: current.revision,
      concern: values.concern,
      cause: values.cause,
      correction: values.correction,
      parts: values.parts.map((p) => ({
        description: p.description,
        quantity: readNumber(p.quantity),
        partNumber: p.partNumber.trim() || null,
      })),
      labour: values.labour.map((l) => ({ operation: l.operation, hours: readNumber(l.hours) })),
      followUps: values.followUps.map((f) => f.text),
      photoIds: values.photoIds,
    };
    const parsed = updateFindingsRequestSchema.safeParse(request);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const [list, index] = issue.path;
        const followUp = list === 'followUps' && typeof index === 'number';
        const name = followUp ? `followUps.${index}.text` : issue.path.join('.');
        form.setError(name as Path<FormValues>, {
          message: followUp ? 'Write the follow-up, or remove it.' : issue.message,
        });
      }
      return;
    }
    // The parent keys this form on the revision, so a successful save starts it afresh.
    save.mutate({ caseId, findings: parsed.data });
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="review-heading"
      className="@container flex flex-col gap-5 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-col gap-1">
        <h2 id="review-heading" className="text-xl font-bold">
          Findings for the repair order
        </h2>
        <p className="text-sm text-ink-muted">
          Editing revision {current.revision}. Saving makes revision {current.revision + 1}; the
          history keeps every revision with who saved it.
        </p>
      </div>

      {conflict ? (
        <Alert tone="danger" role="alert" title="Someone saved these findings meanwhile">
          <p>{save.error?.message} What you typed here will be replaced.</p>
          <div>
            <Button variant="secondary" onClick={onReload}>
              Load the latest revision
            </Button>
          </div>
        </Alert>
      ) : save.error ? (
        <Alert tone="danger" role="alert" title="Revision not saved">
          <p>{save.error.message}</p>
        </Alert>
      ) : null}

      <TextAreaField
        label="Concern"
        rows={2}
        className="field-sizing-content"
        error={errors.concern?.message}
        {...form.register('concern')}
      />
      <TextAreaField
        label="Cause"
        rows={4}
        className="field-sizing-content min-h-32"
        error={errors.cause?.message}
        {...form.register('cause')}
      />
      <TextAreaField
        label="Correction"
        rows={3}
        className="field-sizing-content min-h-24"
        error={errors.correction?.message}
        {...form.register('correction')}
      />

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Parts</legend>
        {parts.fields.length === 0 ? <p className="text-ink-muted">No parts.</p> : null}
        {parts.fields.map((field, index) => (
          <div
            key={field.id}
            className="grid gap-3 rounded-control border-2 border-line p-3 @lg:grid-cols-[minmax(0,1fr)_6.5rem_9rem] @lg:items-end"
          >
            <TextField
              label={`Part ${index + 1}`}
              error={errors.parts?.[index]?.description?.message}
              {...form.register(`parts.${index}.description`)}
            />
            <TextField
              label={
                <>
                  Quantity<span className="sr-only"> of part {index + 1}</span>
                </>
              }
              inputMode="decimal"
              error={errors.parts?.[index]?.quantity?.message}
              {...form.register(`parts.${index}.quantity`)}
            />
            <TextField
              label={
                <>
                  Part number<span className="sr-only"> of part {index + 1}</span>
                </>
              }
              autoCapitalize="characters"
              spellCheck={false}
              error={errors.parts?.[index]?.partNumber?.message}
              {...form.register(`parts.${index}.partNumber`)}
            />
            <div className="@lg:col-span-3">
              <Button variant="quiet" onClick={() => parts.remove(index)}>
                Remove part {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button
            variant="secondary"
            onClick={() => parts.append({ description: '', quantity: '1', partNumber: '' })}
          >
            Add part
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Labour</legend>
        {labour.fields.length === 0 ? <p className="text-ink-muted">No labour lines.</p> : null}
        {labour.fields.map((field, index) => (
          <div
            key={field.id}
            className="grid gap-3 rounded-control border-2 border-line p-3 @lg:grid-cols-[minmax(0,1fr)_7rem] @lg:items-end"
          >
            <TextField
              label={`Operation ${index + 1}`}
              error={errors.labour?.[index]?.operation?.message}
              {...form.register(`labour.${index}.operation`)}
            />
            <TextField
              label={
                <>
                  Hours<span className="sr-only"> for operation {index + 1}</span>
                </>
              }
              inputMode="decimal"
              error={errors.labour?.[index]?.hours?.message}
              {...form.register(`labour.${index}.hours`)}
            />
            <div className="@lg:col-span-2">
              <Button variant="quiet" onClick={() => labour.remove(index)}>
                Remove operation {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button variant="secondary" onClick={() => labour.append({ operation: '', hours: '' })}>
            Add labour line
          </Button>
        </div>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-lg font-bold">Follow-ups</legend>
        <p className="text-sm text-ink-muted">
          Keep each follow-up’s caution in its words: the customer reads them in the PDF.
        </p>
        {followUps.fields.length === 0 ? <p className="text-ink-muted">No follow-ups.</p> : null}
        {followUps.fields.map((field, index) => (
          <div key={field.id} className="flex flex-col gap-2">
            <TextAreaField
              label={`Follow-up ${index + 1}`}
              rows={2}
              className="field-sizing-content min-h-24"
              error={errors.followUps?.[index]?.text?.message}
              {...form.register(`followUps.${index}.text`)}
            />
            <div>
              <Button variant="quiet" onClick={() => followUps.remove(index)}>
                Remove follow-up {index + 1}
              </Button>
            </div>
          </div>
        ))}
        <div>
          <Button variant="secondary" onClick={() => followUps.append({ text: '' })}>
            Add follow-up
          </Button>
        </div>
      </fieldset>

      <PhotoPicker
        photos={photos}
        chosen={photoIds}
        limit={findingsPhotoLimit}
        error={errors.photoIds?.message}
        onChange={(next) => form.setValue('photoIds', next, { shouldDirty: true })}
      />

      <div className="flex flex-wrap items-center gap-3 border-t-2 border-line pt-4">
        <Button
          type="submit"
          size="large"
          busy={save.isPending}
          busyLabel="Saving…"
          disabled={!isDirty}
        >
          Save revision {current.revision + 1}
        </Button>
        {isDirty ? (
          <>
            <Button variant="quiet" onClick={() => form.reset(toValues(current))}>
              Undo my changes
            </Button>
            <p className="text-sm text-ink-muted">Unsaved changes.</p>
          </>
        ) : (
          <p className="text-sm text-ink-muted">No changes to save.</p>
        )}
      </div>
    </form>
  );
}
