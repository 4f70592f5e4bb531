// Writes a parsed log onto its case in one transaction: the original file as an attachment (its
// bytes are already in storage), the case event, the log with its series and analysis, and the
// confirmed mapping for its source. Either all of it is written or none of it is.
import type { MappingSource } from '@heatpath/contracts';
import type { CandidateColumn, TemperatureSeries } from '@heatpath/temperature-log';
import { Attachment, TemperatureLog, TemperatureLogUpload } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { attachmentLimits } from '../attachments/add-attachment';
import { appendCaseEvent } from '../cases/append-case-event';
import { findCase } from '../cases/find-case';
import { analyseCaseLog, engineFactsForCase } from './log-analysis';
import { rememberMapping } from './remembered-mappings';
import { seriesColumns } from './series-columns';

export interface StoredLogFile {
  originalName: string;
  byteSize: number;
  /** Where the original bytes already are. */
  storageKey: string;
}

export async function storeTemperatureLog(options: {
  actor: Actor;
  caseId: string;
  nodeId: string | null;
  file: StoredLogFile;
  series: TemperatureSeries;
  mappingSource: MappingSource;
  columns: readonly CandidateColumn[] | null;
  /** Keep the mapping for the next log from the same source. */
  remember: boolean;
  /** The pending upload this finishes; it is removed in the same transaction. */
  pendingUploadId?: string;
}): Promise<{ log: TemperatureLog; attachment: Attachment }> {
  const { actor, caseId, nodeId, file, series } = options;
  // Outside the transaction: the analysis is the slow part and needs no lock.
  const analysis = analyseCaseLog(series, await engineFactsForCase({ actor, caseId }));
  const columns = seriesColumns(series);
  return withTransaction(async (transaction) => {
    const locked = await findCase({ actor, caseId, transaction, lock: true, bare: true });
    if (options.pendingUploadId) {
      const pending = await TemperatureLogUpload.findOne({
        where: { id: options.pendingUploadId, caseId: locked.id, workshopId: actor.workshopId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!pending) {
        throw new AppError('conflict', 'That upload has just been finished on another device.');
      }
      await pending.destroy({ transaction });
    }
    const count = await Attachment.count({ where: { caseId: locked.id }, transaction });
    if (count >= attachmentLimits.maxPerCase) {
      throw new AppError(
        'payload_too_large',
        `A case can hold at most ${attachmentLimits.maxPerCase} files.`,
      );
    }
    const attachment = await Attachment.create(
      {
        caseId: locked.id,
        workshopId: actor.workshopId,
        nodeId,
        kind: 'log',
        storageKey: file.storageKey,
        thumbnailKey: null,
        originalName: file.originalName.slice(0, 255),
        mediaType: 'text/plain',
        byteSize: file.byteSize,
        width: null,
        height: null,
        uploadedBy: actor.userId,
      },
      { transaction },
    );
    const log = await TemperatureLog.create(
      {
        workshopId: actor.workshopId,
        caseId: locked.id,
        nodeId,
        attachmentId: attachment.id,
        sourceSignature: series.sourceSignature,
        mapping: series.mapping,
        mappingSource: options.mappingSource,
        columns: options.columns ? [...options.columns] : null,
        detected: series.detected,
        readings: series.rows,
        skippedRows: series.skippedRows,
        durationSeconds: analysis.log.durationSeconds,
        startedAtText: series.startedAt?.slice(0, 64) ?? null,
        ...columns,
        analysis,
        uploadedBy: actor.userId,
      },
      { transaction },
    );
    await appendCaseEvent({
      actor,
      kase: locked,
      kind: 'attachment',
      nodeId,
      payload: { attachmentId: attachment.id, name: attachment.originalName, logId: log.id },
      transaction,
    });
    if (options.remember) {
      await rememberMapping({
        actor,
        sourceSignature: series.sourceSignature,
        mapping: series.mapping,
        transaction,
      });
    }
    return { log, attachment };
  });
}
