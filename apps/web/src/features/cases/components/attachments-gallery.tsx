// Every photo and file on the case, with the step each was taken at, and an upload for the case
// as a whole (photos of it wait in the outbox until sent, shown from the tablet meanwhile).
import type { CaseAttachment } from '@heatpath/contracts';
import { useQueuedPhotos } from '../../../lib/outbox';
import { AttachButton } from './attach-button';
import { AttachmentThumbnails } from './attachment-thumbnails';
import { QueuedPhotos } from './queued-photos';

interface AttachmentsGalleryProps {
  caseId: string;
  attachments: readonly CaseAttachment[];
  stepTitle: (nodeId: string) => string | null;
  canAttach: boolean;
}

export function AttachmentsGallery({
  caseId,
  attachments,
  stepTitle,
  canAttach,
}: AttachmentsGalleryProps) {
  // Photos of the whole case still on this tablet (taken here, not sent yet).
  const queued = useQueuedPhotos(caseId, null);
  return (
    <section
      aria-labelledby="attachments-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="attachments-heading" className="text-lg font-bold">
        Photos and files{' '}
        <span className="text-sm font-normal text-ink-muted">({attachments.length})</span>
      </h2>
      {attachments.length === 0 && queued.length === 0 ? (
        <p className="text-ink-muted">Nothing attached yet.</p>
      ) : null}
      <AttachmentThumbnails
        attachments={attachments}
        captionFor={(attachment) =>
          attachment.nodeId ? stepTitle(attachment.nodeId) : 'Whole case'
        }
      />
      <QueuedPhotos photos={queued} />
      {canAttach ? <AttachButton caseId={caseId} kind="any" /> : null}
    </section>
  );
}
