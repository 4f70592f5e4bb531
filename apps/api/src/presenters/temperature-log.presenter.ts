// Temperature logs as the API returns them: a line in the case's list, the whole log with its
// analysis, candidate readings and chart series, and the "needs mapping" answer for the form.
import type {
  ChartSeries,
  LogNeedsMapping,
  TemperatureLogDetail,
  TemperatureLogSummary,
} from '@heatpath/contracts';
import { candidateReadings } from '@heatpath/temperature-log';
import type { NeedsMappingResult, TemperatureLogAnalysis } from '@heatpath/temperature-log';
import type { Attachment, TemperatureLog, TemperatureLogUpload, User } from '../db/models/index';
import { channelsOf } from '../lib/log-channels';

const unknownPerson = { id: '00000000-0000-0000-0000-000000000000', name: 'Unknown' };

export function presentLogSummary(
  log: TemperatureLog,
  attachment: Attachment,
  uploader: User | null | undefined,
): TemperatureLogSummary {
  const { analysis } = log;
  return {
    id: log.id,
    caseId: log.caseId,
    nodeId: log.nodeId,
    name: attachment.originalName,
    byteSize: attachment.byteSize,
    attachmentId: attachment.id,
    fileUrl: `/api/cases/${log.caseId}/attachments/${attachment.id}/file`,
    readings: log.readings,
    skippedRows: log.skippedRows,
    durationSeconds: log.durationSeconds,
    startedAt: log.startedAtText,
    channels: channelsOf(log.mapping),
    sourceSignature: log.sourceSignature,
    mapping: log.mapping,
    mappingSource: log.mappingSource,
    detected: log.detected,
    headline: {
      peakC: analysis.peak.valueC,
      episodes: analysis.overTemperature.episodes.length,
      openingC: analysis.opening.found ? analysis.opening.temperatureC : null,
    },
    uploadedBy: uploader ? { id: uploader.id, name: uploader.name } : unknownPerson,
    createdAt: log.createdAt.toISOString(),
  };
}

export function presentLogDetail(options: {
  log: TemperatureLog;
  attachment: Attachment;
  uploader: User | null | undefined;
  /** The analysis at the settings asked for (the stored one at the defaults). */
  analysis: TemperatureLogAnalysis;
  series: ChartSeries;
}): TemperatureLogDetail {
  const { log, attachment, uploader, analysis, series } = options;
  return {
    ...presentLogSummary(log, attachment, uploader),
    analysis,
    candidateReadings: candidateReadings(analysis),
    series,
    columns: log.columns,
  };
}

export function presentNeedsMapping(
  upload: TemperatureLogUpload,
  result: NeedsMappingResult,
  rememberedProblem: string | null,
): LogNeedsMapping {
  return {
    status: 'needs-mapping',
    pendingUploadId: upload.id,
    name: upload.originalName,
    sourceSignature: result.sourceSignature,
    detected: result.detected,
    columns: [...result.columns],
    proposed: result.proposed,
    unsure: [...result.unsure],
    reasons: [...result.reasons],
    rememberedProblem,
  };
}
