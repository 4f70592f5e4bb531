// One button that opens the camera or the file picker. A photo request opens the rear camera on a
// tablet or phone, and the photo (also one chosen through "Attach file") goes into the outbox: it shows at once as "waiting to send" and
// is sent before the answers given after it, with or without a network. Other files (logs) are
// uploaded at once; a failed upload says why, and one lost to the network keeps the file so
// "Retry" sends it again without choosing it anew.
import { useRef, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { enqueuePhoto } from '../../../lib/outbox';
import { useUploadAttachment } from '../api/upload-attachment';

export type AttachKind = 'photo' | 'log' | 'any';

const accepts: Record<AttachKind, string> = {
  photo: 'image/*',
  log: '.csv,.txt,.log,.tsv,text/csv,text/plain',
  any: 'image/*,application/pdf,.csv,.txt,.log,.tsv',
};

const labels: Record<AttachKind, string> = {
  photo: 'Attach photo',
  log: 'Attach log',
  any: 'Attach file',
};

interface AttachButtonProps {
  caseId: string;
  nodeId?: string | undefined;
  kind: AttachKind;
  /** What the upload is for, read after the button's name ("Photo of the leak"). */
  describedBy?: string | undefined;
  disabled?: boolean;
}

export function AttachButton({
  caseId,
  nodeId,
  kind,
  describedBy,
  disabled = false,
}: AttachButtonProps) {
  const input = useRef<HTMLInputElement>(null);
  const upload = useUploadAttachment();
  const [file, setFile] = useState<File | null>(null);
  const [added, setAdded] = useState<{ name: string; queued: boolean } | null>(null);
  const [notKept, setNotKept] = useState(false);

  const queue = (chosen: File) => {
    setAdded(null);
    setNotKept(false);
    enqueuePhoto({ caseId, nodeId: nodeId ?? null, file: chosen }).then(
      () => setAdded({ name: chosen.name, queued: true }),
      () => setNotKept(true),
    );
  };

  const send = (chosen: File) => {
    setAdded(null);
    upload.mutate(
      { caseId, file: chosen, nodeId, photoOnly: kind === 'photo' },
      {
        onSuccess: (attachment) => {
          setFile(null);
          setAdded({ name: attachment.name, queued: false });
        },
      },
    );
  };

  const lost =
    upload.error &&
    (!isApiError(upload.error) || upload.error.code === 'network' || upload.error.status >= 500);

  return (
    <div className="flex flex-col gap-2">
      <div>
        <Button
          variant="secondary"
          onClick={() => input.current?.click()}
          busy={upload.isPending}
          busyLabel="Uploading…"
          disabled={disabled}
          aria-describedby={describedBy}
        >
          <span aria-hidden="true" className="text-lg leading-none">
            +
          </span>
          {labels[kind]}
        </Button>
        <input
          ref={input}
          type="file"
          hidden
          aria-label={`${labels[kind]}: choose the file`}
          accept={accepts[kind]}
          {...(kind === 'photo' ? { capture: 'environment' as const } : {})}
          onChange={(event) => {
            const chosen = event.target.files?.[0];
            event.target.value = '';
            if (!chosen) return;
            // A photo, also one chosen as "any file", waits in the outbox like an answer.
            if (kind === 'photo' || (kind === 'any' && chosen.type.startsWith('image/'))) {
              queue(chosen);
              return;
            }
            setFile(chosen);
            send(chosen);
          }}
        />
      </div>
      {notKept ? (
        <Alert tone="danger" role="alert" title="Photo not kept">
          <p>The photo could not be read from the camera or the file. Take it again.</p>
        </Alert>
      ) : upload.error ? (
        <Alert tone="danger" role="alert" title={lost ? 'Not uploaded yet' : 'Not attached'}>
          <p>{upload.error.message}</p>
          {lost && file ? (
            <div>
              <Button
                variant="secondary"
                onClick={() => send(file)}
                busy={upload.isPending}
                busyLabel="Uploading…"
              >
                Retry upload
              </Button>
            </div>
          ) : null}
        </Alert>
      ) : added ? (
        <p role="status" className="flex items-center gap-2 font-semibold text-ok-ink">
          <span aria-hidden="true">✓</span> {added.queued ? 'Kept' : 'Attached'} {added.name}
        </p>
      ) : null}
    </div>
  );
}
