// POST /api/cases/:caseId/attachments: one photo or file, sent as multipart form data. The browser
// sets the multipart boundary itself, so no Content-Type is given here; the client header still is.
import { caseAttachmentSchema } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequestForm } from '../../../lib/api-client';
import { casesKeys } from '../../../lib/query-keys';

export interface UploadAttachmentInput {
  caseId: string;
  file: File;
  /** The step the file belongs to; absent for the case as a whole. */
  nodeId?: string | undefined;
  /** Set where the step asks for a photo: the API then refuses anything but an image. */
  photoOnly?: boolean;
}

export function uploadAttachment({ caseId, file, nodeId, photoOnly }: UploadAttachmentInput) {
  const form = new FormData();
  form.append('file', file, file.name);
  if (nodeId) form.append('nodeId', nodeId);
  if (photoOnly) form.append('photoOnly', 'true');
  return apiRequestForm(
    `/api/cases/${encodeURIComponent(caseId)}/attachments`,
    caseAttachmentSchema,
    form,
  );
}

export function useUploadAttachment() {
  const queryClient = useQueryClient();
  return useMutation({
    // Fail at once when offline, so the screen can say so instead of the request waiting silently.
    networkMode: 'always',
    mutationFn: uploadAttachment,
    onSuccess: (_attachment, { caseId }) =>
      queryClient.invalidateQueries({ queryKey: casesKeys.detail(caseId) }),
  });
}
