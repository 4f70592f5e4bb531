// Reads a stored log again with a different column mapping (a remembered mapping applied
// automatically may not suit this export): the series and analysis are replaced in one
// transaction, and the new mapping is remembered for the source. The original file is unchanged.
import type { TemperatureLogDetail } from '@heatpath/contracts';
import type { ColumnMapping } from '@heatpath/temperature-log';
import { TemperatureLog } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogDetail } from '../../presenters/temperature-log.presenter';
import { chartSeries } from './chart-series';
import { findTemperatureLog } from './find-temperature-log';
import { readLogFile, readStoredBytes } from './read-log-file';
import { analyseCaseLog, engineFactsForCase } from './log-analysis';
import { rememberMapping } from './remembered-mappings';
import { seriesColumns } from './series-columns';

export async function changeLogMapping(options: {
  actor: Actor;
  caseId: string;
  logId: string;
  mapping: ColumnMapping;
  store: FileStore;
}): Promise<TemperatureLogDetail> {
  const { actor, caseId, logId, mapping, store } = options;
  assertCan(actor, 'logs.upload');
  const found = await findTemperatureLog({ actor, caseId, logId, withSeries: false });
  const bytes = await readStoredBytes(await store.get(found.attachment.storageKey));
  const result = await readLogFile({ bytes, mapping });
  if (result.status === 'needs-mapping') {
    const message = result.reasons.join(' ');
    throw new AppError('validation_failed', message, { mapping: message });
  }
  const { series } = result;
  const analysis = analyseCaseLog(series, await engineFactsForCase({ actor, caseId }));
  await withTransaction(async (transaction) => {
    await TemperatureLog.update(
      {
        sourceSignature: series.sourceSignature,
        mapping: series.mapping,
        mappingSource: 'confirmed',
        detected: series.detected,
        readings: series.rows,
        skippedRows: series.skippedRows,
        durationSeconds: analysis.log.durationSeconds,
        startedAtText: series.startedAt?.slice(0, 64) ?? null,
        ...seriesColumns(series),
        analysis,
      },
      { where: { id: found.id, workshopId: actor.workshopId }, transaction },
    );
    await rememberMapping({
      actor,
      sourceSignature: series.sourceSignature,
      mapping: series.mapping,
      transaction,
    });
  });
  const log = await findTemperatureLog({ actor, caseId, logId, withSeries: false });
  return presentLogDetail({
    log,
    attachment: log.attachment,
    uploader: log.uploader,
    analysis,
    series: chartSeries(series, {}),
  });
}
