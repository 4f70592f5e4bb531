// POST /api/cases/:caseId/logs/:pendingUploadId/mapping finishes an upload whose columns were
// ambiguous (the file is kept on the server, so nothing is uploaded again), and
// PUT /api/cases/:caseId/logs/:logId/mapping reads a stored log again with other columns.
import {
  temperatureLogDetailSchema,
  logUploadResultSchema,
  type LogMappingRequest,
  type LogUploadResult,
} from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { temperatureLogsKeys } from '../../../lib/query-keys';
import { rememberStoredLog } from './upload-case-log';

export interface MapPendingUploadInput {
  caseId: string;
  pendingUploadId: string;
  mapping: LogMappingRequest['mapping'];
}

export function mapPendingUpload({ caseId, pendingUploadId, mapping }: MapPendingUploadInput) {
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/logs/${encodeURIComponent(pendingUploadId)}/mapping`,
    logUploadResultSchema,
    { method: 'POST', body: { mapping } },
  );
}

export function useMapPendingUpload(
  options: { onStored?: (result: LogUploadResult) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: mapPendingUpload,
    onSuccess: (result, { caseId }) => {
      rememberStoredLog(queryClient, caseId, result);
      if (result.status === 'stored') options.onStored?.(result);
    },
  });
}

export interface ChangeLogMappingInput {
  caseId: string;
  logId: string;
  mapping: LogMappingRequest['mapping'];
}

export function changeLogMapping({ caseId, logId, mapping }: ChangeLogMappingInput) {
  return apiRequest(
    `/api/cases/${encodeURIComponent(caseId)}/logs/${encodeURIComponent(logId)}/mapping`,
    temperatureLogDetailSchema,
    { method: 'PUT', body: { mapping } },
  );
}

export function useChangeLogMapping() {
  const queryClient = useQueryClient();
  return useMutation({
    networkMode: 'always',
    mutationFn: changeLogMapping,
    onSuccess: async (log, { caseId }) => {
      await queryClient.invalidateQueries({ queryKey: temperatureLogsKeys.ofCase(caseId) });
      queryClient.setQueryData(temperatureLogsKeys.detail(caseId, log.id, {}), log);
    },
  });
}
