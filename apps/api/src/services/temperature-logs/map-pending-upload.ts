// Finishes an upload that was waiting for its column mapping: the kept file is read again with
// the person's mapping and stored on the case, and the mapping is remembered for its source.
// A mapping that reads the file wrongly (text in the coolant column, say) is refused with the
// line, and the upload stays waiting so another mapping can be tried.
import type { LogUploadResult } from '@heatpath/contracts';
import type { ColumnMapping } from '@heatpath/temperature-log';
import type { User } from '../../db/models/index';
import type { FileStore } from '../../lib/storage/file-store';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogDetail, presentNeedsMapping } from '../../presenters/temperature-log.presenter';
import { findCase } from '../cases/find-case';
import { chartSeries } from './chart-series';
import { findPendingUpload } from './pending-uploads';
import { readLogFile, readStoredBytes } from './read-log-file';
import { storeTemperatureLog } from './store-temperature-log';

export async function mapPendingUpload(options: {
  actor: Actor;
  uploader: User;
  caseId: string;
  uploadId: string;
  mapping: ColumnMapping;
  store: FileStore;
}): Promise<LogUploadResult> {
  const { actor, uploader, caseId, uploadId, mapping, store } = options;
  assertCan(actor, 'logs.upload');
  const kase = await findCase({ actor, caseId });
  const upload = await findPendingUpload({ actor, caseId: kase.id, uploadId });
  const bytes = await readStoredBytes(await store.get(upload.storageKey));
  const result = await readLogFile({ bytes, mapping });
  // Still unsure (the unit, when the mapping left it out): ask again for the same upload.
  if (result.status === 'needs-mapping') return presentNeedsMapping(upload, result, null);
  // The file's columns, kept so the mapping can be changed later; reading stops at the request.
  const described = await readLogFile({ bytes });
  const { log, attachment } = await storeTemperatureLog({
    actor,
    caseId: kase.id,
    nodeId: upload.nodeId,
    file: {
      originalName: upload.originalName,
      byteSize: upload.byteSize,
      storageKey: upload.storageKey,
    },
    series: result.series,
    mappingSource: 'confirmed',
    columns: described.status === 'needs-mapping' ? described.columns : null,
    remember: true,
    pendingUploadId: upload.id,
  });
  return {
    status: 'stored',
    log: presentLogDetail({
      log,
      attachment,
      uploader,
      analysis: log.analysis,
      series: chartSeries(result.series, {}),
    }),
  };
}
