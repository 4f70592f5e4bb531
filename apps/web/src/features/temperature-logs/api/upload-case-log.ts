// POST /api/cases/:caseId/logs: one log file as multipart form data, optionally for a step. The
// answer is the stored log, or the columns to map when the file does not say which is which.
import { logUploadResultSchema, type LogUploadResult } from '@heatpath/contracts';
import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { apiRequestForm } from '../../../lib/api-client';
import { temperatureLogsKeys } from '../../../lib/query-keys';

export interface UploadCaseLogInput {
  caseId: string;
  file: File;
  nodeId?: string | undefined;
}

export function uploadCaseLog({ caseId, file, nodeId }: UploadCaseLogInput) {
  const form = new FormData();
  form.append('file', file, file.name);
  if (nodeId) form.append('nodeId', nodeId);
  return apiRequestForm(
    `/api/cases/${encodeURIComponent(caseId)}/logs`,
    logUploadResultSchema,
    form,
  );
}

/** After a log is stored: its detail is known, and the list is out of date. */
export function rememberStoredLog(
  queryClient: QueryClient,
  caseId: string,
  result: LogUploadResult,
): void {
  if (result.status !== 'stored') return;
  queryClient.setQueryData(temperatureLogsKeys.detail(caseId, result.log.id, {}), result.log);
  void queryClient.invalidateQueries({ queryKey: temperatureLogsKeys.list(caseId) });
}

export function useUploadCaseLog(options: { onStored?: (result: LogUploadResult) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: uploadCaseLog,
    onSuccess: (result, { caseId }) => {
      rememberStoredLog(queryClient, caseId, result);
      if (result.status === 'stored') options.onStored?.(result);
    },
  });
}
