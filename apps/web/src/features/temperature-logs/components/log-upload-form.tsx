// Choosing a log file and sending it. The server reads it at once: the answer is the stored log,
// the columns to map, or the line that stopped it, shown here in the API's words.
import type { LogUploadResult } from '@heatpath/contracts';
import { temperatureLogMaxBytes } from '@heatpath/contracts';
import { useId, useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldError } from '../../../components/ui/field';
import { useUploadCaseLog } from '../api/upload-case-log';

interface LogUploadFormProps {
  caseId: string;
  /** The case's current step, which the log can be attached to. */
  step: { nodeId: string; title: string; asksForLog: boolean } | null;
  onResult: (result: LogUploadResult) => void;
  onStored?: (result: LogUploadResult) => void;
}

export function LogUploadForm({ caseId, step, onResult, onStored }: LogUploadFormProps) {
  const id = useId();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [forStep, setForStep] = useState(step?.asksForLog ?? false);
  const [problem, setProblem] = useState<string | null>(null);
  const upload = useUploadCaseLog({ onStored });

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!file) {
      setProblem('Choose the log file first.');
      return;
    }
    if (file.size > temperatureLogMaxBytes) {
      setProblem(
        `A log can be at most ${temperatureLogMaxBytes / 1024 / 1024} MB; split a longer log.`,
      );
      return;
    }
    setProblem(null);
    upload.mutate(
      { caseId, file, nodeId: forStep && step ? step.nodeId : undefined },
      {
        onSuccess: (result) => {
          onResult(result);
          setFile(null);
          if (input.current) input.current.value = '';
        },
      },
    );
  };

  return (
    <form noValidate aria-label="Upload a log" onSubmit={submit} className="flex flex-col gap-4">
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${id}-file`} className="font-semibold">
          Log file
        </label>
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          A CSV or text export from the scan tool or data logger, up to{' '}
          {temperatureLogMaxBytes / 1024 / 1024} MB: a time column and the coolant temperature,
          separated by commas, semicolons or tabs.
        </p>
        <input
          ref={input}
          id={`${id}-file`}
          type="file"
          accept=".csv,.txt,.log,.tsv,text/csv,text/plain"
          aria-describedby={`${id}-hint${problem ? ` ${id}-error` : ''}`}
          aria-invalid={problem ? true : undefined}
          onChange={(event) => {
            setFile(event.target.files?.[0] ?? null);
            setProblem(null);
            upload.reset();
          }}
          className="min-h-touch w-full rounded-control border-2 border-dashed border-line-strong bg-surface p-2 text-base file:mr-3 file:min-h-10 file:rounded-control file:border-2 file:border-line-strong file:bg-sunken file:px-4 file:font-semibold"
        />
        {problem ? <FieldError id={`${id}-error`} message={problem} /> : null}
      </div>
      {step ? (
        <label className="flex min-h-touch items-center gap-3">
          <input
            type="checkbox"
            checked={forStep}
            onChange={(event) => setForStep(event.target.checked)}
            className="size-6 shrink-0 accent-primary"
          />
          <span>
            Attach it to the current step, “{step.title}”
            {step.asksForLog ? ' (the step asks for a log)' : ''}
          </span>
        </label>
      ) : null}
      {upload.error ? (
        <Alert tone="danger" role="alert" title="Log not read">
          <p>{upload.error.message}</p>
          <p>Nothing was saved. Correct the file or choose another, then upload it again.</p>
        </Alert>
      ) : null}
      <div>
        <Button type="submit" size="large" busy={upload.isPending} busyLabel="Reading the log…">
          Upload log
        </Button>
      </div>
    </form>
  );
}
