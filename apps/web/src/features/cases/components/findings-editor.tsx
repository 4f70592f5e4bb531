// The technician's findings: drafted by the server when the walk reached its outcome, edited here
// (concern, cause, correction, parts, labour, follow-ups) and saved against the revision that was
// opened, so two people never overwrite each other unknowingly. "Mark diagnosed" closes the walk.
import { updateFindingsRequestSchema, type Findings } from '@heatpath/contracts';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import {
  FindingsLinesFields,
  type FindingsFormValues,
} from '../../../components/findings-lines-fields';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useMarkDiagnosed } from '../api/mark-diagnosed';
import { useSaveFindings } from '../api/save-findings';
import { formatDateTime } from '../case-format';
import { readOptionalNumber } from '../../../lib/read-number';

function toValues(findings: Findings): FindingsFormValues {
  return {
    concern: findings.concern,
    cause: findings.cause,
    correction: findings.correction,
    parts: findings.parts.map((part) => ({
      description: part.description,
      quantity: String(part.quantity),
      partNumber: part.partNumber ?? '',
    })),
    labour: findings.labour.map((line) => ({
      operation: line.operation,
      hours: String(line.hours),
    })),
    followUps: findings.followUps.map((text) => ({ text })),
  };
}

interface FindingsEditorProps {
  caseId: string;
  findings: Findings;
  canMarkDiagnosed: boolean;
  /** Why the case cannot be marked diagnosed yet (evidence missing, answers still waiting). */
  blockedReason?: string | null;
}

export function FindingsEditor({
  caseId,
  findings,
  canMarkDiagnosed,
  blockedReason = null,
}: FindingsEditorProps) {
  const save = useSaveFindings();
  const diagnosed = useMarkDiagnosed();
  const [base, setBase] = useState(findings.revision);
  const [saved, setSaved] = useState<string | null>(null);
  const form = useForm<FindingsFormValues>({ defaultValues: toValues(findings) });
  const { errors, isDirty } = form.formState;
  const newerOnServer = findings.revision !== base;
  const conflict = isApiError(save.error) && save.error.status === 409;

  const loadLatest = () => {
    form.reset(toValues(findings));
    setBase(findings.revision);
    save.reset();
  };

  const submit = form.handleSubmit((values) => {
    setSaved(null);
    const request = {
      revision: base,
      concern: values.concern,
      cause: values.cause,
      correction: values.correction,
      parts: values.parts.map((part) => ({
        description: part.description,
        quantity: readOptionalNumber(part.quantity),
        partNumber: part.partNumber.trim() || null,
      })),
      labour: values.labour.map((line) => ({
        operation: line.operation,
        hours: readOptionalNumber(line.hours),
      })),
      followUps: values.followUps.map((followUp) => followUp.text),
    };
    const parsed = updateFindingsRequestSchema.safeParse(request);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const [list, index] = issue.path;
        const followUp = list === 'followUps' && typeof index === 'number';
        // The form keeps follow-ups as { text } rows; the request as plain strings.
        const name = followUp ? `followUps.${index}.text` : issue.path.join('.');
        form.setError(name as Path<FindingsFormValues>, {
          message: followUp ? 'Write the follow-up, or remove it.' : issue.message,
        });
      }
      return;
    }
    save.mutate(
      { caseId, findings: parsed.data },
      {
        onSuccess: (detail) => {
          if (!detail.findings) return;
          form.reset(toValues(detail.findings));
          setBase(detail.findings.revision);
          setSaved(`Saved at ${formatDateTime(detail.findings.updatedAt)}.`);
        },
      },
    );
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="findings-heading"
      className="@container flex flex-col gap-5 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h2 id="findings-heading" className="text-xl font-bold">
          Findings for the repair order
        </h2>
        <p className="text-sm text-ink-muted">
          Drafted from the finding; edit before you mark the case diagnosed.
          {findings.updatedBy
            ? ` Last saved by ${findings.updatedBy.name}, ${formatDateTime(findings.updatedAt)}.`
            : ''}
        </p>
      </div>

      {conflict || (newerOnServer && !save.isPending) ? (
        <Alert tone="danger" role="alert" title="Someone else saved these findings">
          <p>
            {conflict ? save.error?.message : 'Newer findings were saved since you opened them.'}{' '}
            Reload them to see the changes; what you typed here will be replaced.
          </p>
          <div>
            <Button variant="secondary" onClick={loadLatest}>
              Reload findings
            </Button>
          </div>
        </Alert>
      ) : save.error ? (
        <Alert tone="danger" role="alert" title="Findings not saved">
          <p>{save.error.message}</p>
        </Alert>
      ) : null}

      <TextAreaField
        label="Concern"
        rows={2}
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

      <FindingsLinesFields form={form} />

      {saved && !isDirty ? (
        <p role="status" className="flex items-center gap-2 font-semibold text-ok-ink">
          <span aria-hidden="true">✓</span> {saved}
        </p>
      ) : null}
      <div className="flex flex-wrap items-center gap-3 border-t-2 border-line pt-4">
        <Button type="submit" size="large" busy={save.isPending} busyLabel="Saving…">
          Save findings
        </Button>
        {canMarkDiagnosed ? (
          <Button
            size="large"
            variant="secondary"
            disabled={isDirty || save.isPending || Boolean(blockedReason)}
            busy={diagnosed.isPending}
            busyLabel="Marking…"
            aria-describedby={
              isDirty ? 'diagnosed-hint' : blockedReason ? 'diagnosed-blocked' : undefined
            }
            onClick={() => diagnosed.mutate(caseId)}
          >
            <span aria-hidden="true">✓</span> Mark diagnosed
          </Button>
        ) : null}
        {isDirty ? (
          <p id="diagnosed-hint" className="text-sm text-ink-muted">
            Unsaved changes. Save the findings before marking the case diagnosed.
          </p>
        ) : canMarkDiagnosed && blockedReason ? (
          <p id="diagnosed-blocked" role="status" className="text-sm font-semibold">
            {blockedReason}
          </p>
        ) : null}
      </div>
      {diagnosed.error ? (
        <Alert tone="danger" role="alert" title="Not marked diagnosed">
          <p>{diagnosed.error.message}</p>
        </Alert>
      ) : null}
    </form>
  );
}
