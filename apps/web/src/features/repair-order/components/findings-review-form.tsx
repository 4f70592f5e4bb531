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
import { useForm, useWatch, type Path } from 'react-hook-form';
import {
  FindingsLinesFields,
  type FindingsFormValues,
} from '../../../components/findings-lines-fields';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useSaveFindingsRevision } from '../api/save-findings-revision';
import { PhotoPicker } from './photo-picker';
import { readNumber } from '../../../lib/read-number';

function toValues(f: FindingsRevision): FindingsFormValues {
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
  const form = useForm<FindingsFormValues>({ defaultValues: toValues(current) });
  const { errors, isDirty } = form.formState;
  const photoIds = useWatch({ control: form.control, name: 'photoIds' }) ?? [];
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
        quantity: readNumber(p.quantity) ?? undefined,
        partNumber: p.partNumber.trim() || null,
      })),
      labour: values.labour.map((l) => ({
        operation: l.operation,
        hours: readNumber(l.hours) ?? undefined,
      })),
      followUps: values.followUps.map((f) => f.text),
      photoIds: values.photoIds,
    };
    const parsed = updateFindingsRequestSchema.safeParse(request);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const [list, index] = issue.path;
        const followUp = list === 'followUps' && typeof index === 'number';
        const name = followUp ? `followUps.${index}.text` : issue.path.join('.');
        form.setError(name as Path<FindingsFormValues>, {
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

      <FindingsLinesFields
        form={form}
        followUpHint="Keep each follow-up’s caution in its words: the customer reads them in the PDF."
      />

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
