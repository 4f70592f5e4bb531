// What the step asks to be recorded (a photo, a log) with the camera or upload right there, what
// has been attached to the step so far, and the step's photos still waiting to be sent.
import type { CaseAttachment } from '@heatpath/contracts';
import type { EvidenceRequest } from '@heatpath/fault-tree';
import { useId } from 'react';
import { Badge } from '../../../components/ui/badge';
import { AttachButton } from './attach-button';
import type { PhotoItem } from '../../../lib/outbox';
import { AttachmentThumbnails } from './attachment-thumbnails';
import { QueuedPhotos } from './queued-photos';

interface StepEvidenceProps {
  caseId: string;
  nodeId: string;
  requests: readonly EvidenceRequest[];
  attachments: readonly CaseAttachment[];
  queuedPhotos: readonly PhotoItem[];
  canAttach: boolean;
}

export function StepEvidence({
  caseId,
  nodeId,
  requests,
  attachments,
  queuedPhotos,
  canAttach,
}: StepEvidenceProps) {
  const baseId = useId();
  if (requests.length === 0 && attachments.length === 0 && queuedPhotos.length === 0) return null;
  return (
    <section aria-labelledby={`${baseId}-heading`} className="flex flex-col gap-3">
      <h3 id={`${baseId}-heading`} className="font-bold">
        Evidence for this step
      </h3>
      {requests.map((request, index) => {
        const labelId = `${baseId}-${index}`;
        return (
          <div key={`${request.kind}:${request.label}`} className="flex flex-col gap-2">
            <p className="flex flex-wrap items-center gap-2">
              <span id={labelId}>{request.label}</span>
              <Badge>{request.required ? 'Required' : 'If you can'}</Badge>
            </p>
            {canAttach ? (
              <AttachButton
                caseId={caseId}
                nodeId={nodeId}
                kind={request.kind}
                describedBy={labelId}
              />
            ) : null}
          </div>
        );
      })}
      <AttachmentThumbnails attachments={attachments} />
      <QueuedPhotos photos={queuedPhotos} />
    </section>
  );
}
