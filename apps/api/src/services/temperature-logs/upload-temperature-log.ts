// Takes a temperature log uploaded to a case. The file is read with the temperature-log package;
// then one of three things happens:
// - it reads (by itself, with the mapping sent along, or with the mapping the workshop confirmed
//   for this source before): the file and the series are stored together on the case;
// - a person has to say which column is which: the file is kept as a pending upload and the
//   form's content is returned, so the mapping can come back without a second upload;
// - it cannot be read: 400 with the package's message naming the line, and nothing is stored.
import type { LogUploadResult } from '@heatpath/contracts';
import type {
  ColumnMapping,
  NeedsMappingResult,
  ParseTemperatureLogResult,
  TemperatureSeries,
} from '@heatpath/temperature-log';
import { randomUUID } from 'node:crypto';
import type { MappingSource } from '@heatpath/contracts';
import type { User } from '../../db/models/index';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogDetail, presentNeedsMapping } from '../../presenters/temperature-log.presenter';
import { findCase } from '../cases/find-case';
import { chartSeries } from './chart-series';
import { discardExpiredUploads, keepPendingUpload } from './pending-uploads';
import { readLogFile } from './read-log-file';
import { findRememberedMapping, sameMapping } from './remembered-mappings';
import { storeTemperatureLog } from './store-temperature-log';

export interface UploadedLog {
  originalName: string;
  bytes: Buffer;
}

interface Reading {
  series: TemperatureSeries;
  mappingSource: MappingSource;
  columns: NeedsMappingResult['columns'] | null;
}

type Decision =
  | { kind: 'read'; reading: Reading }
  | { kind: 'ask'; result: NeedsMappingResult; rememberedProblem: string | null };

/** Tries the workshop's remembered mapping; a mapping that no longer fits is reported, not thrown. */
async function tryRemembered(
  bytes: Buffer,
  mapping: ColumnMapping,
): Promise<{ result: ParseTemperatureLogResult } | { problem: string }> {
  try {
    return { result: await readLogFile({ bytes, mapping }) };
  } catch (error) {
    if (error instanceof AppError) return { problem: error.message };
    throw error;
  }
}

/** How the file is to be read, given what it says and what the workshop remembers. */
export async function decideReading(options: {
  actor: Actor;
  bytes: Buffer;
  mapping?: ColumnMapping | undefined;
}): Promise<Decision> {
  const { actor, bytes, mapping } = options;
  const first = await readLogFile({ bytes, mapping });
  if (mapping) {
    if (first.status === 'needs-mapping')
      return { kind: 'ask', result: first, rememberedProblem: null };
    // The file's columns, so the mapping can be changed later; reading stops at the request.
    const described = await readLogFile({ bytes });
    const columns = described.status === 'needs-mapping' ? described.columns : null;
    return { kind: 'read', reading: { series: first.series, mappingSource: 'confirmed', columns } };
  }
  const signature =
    first.status === 'parsed' ? first.series.sourceSignature : first.sourceSignature;
  const remembered = await findRememberedMapping({ actor, sourceSignature: signature });
  if (first.status === 'parsed') {
    const reading: Reading = { series: first.series, mappingSource: 'detected', columns: null };
    // The file names its own columns, but a person chose otherwise for this source before.
    if (remembered && !sameMapping(remembered, first.series.mapping)) {
      const again = await tryRemembered(bytes, remembered);
      if ('result' in again && again.result.status === 'parsed') {
        return {
          kind: 'read',
          reading: { series: again.result.series, mappingSource: 'remembered', columns: null },
        };
      }
    }
    return { kind: 'read', reading };
  }
  if (!remembered) return { kind: 'ask', result: first, rememberedProblem: null };
  const again = await tryRemembered(bytes, remembered);
  if ('result' in again && again.result.status === 'parsed') {
    return {
      kind: 'read',
      reading: { series: again.result.series, mappingSource: 'remembered', columns: first.columns },
    };
  }
  return {
    kind: 'ask',
    result: first,
    rememberedProblem:
      'problem' in again
        ? `The columns remembered for this kind of file do not fit this one. ${again.problem}`
        : null,
  };
}

export async function uploadTemperatureLog(options: {
  actor: Actor;
  uploader: User;
  caseId: string;
  nodeId: string | null;
  mapping?: ColumnMapping | undefined;
  /** null when the form carried no file: refused after the case is found, so another
   * workshop's case is "not found" whatever the request holds. */
  file: UploadedLog | null;
  store: FileStore;
}): Promise<LogUploadResult> {
  const { actor, uploader, caseId, nodeId, file, store } = options;
  assertCan(actor, 'logs.upload');
  const kase = await findCase({ actor, caseId });
  if (!file) throw new AppError('bad_request', 'Choose a log file to upload (form field "file").');
  await discardExpiredUploads({ actor, store });

  const decision = await decideReading({ actor, bytes: file.bytes, mapping: options.mapping });
  if (decision.kind === 'ask') {
    const upload = await keepPendingUpload({
      actor,
      caseId: kase.id,
      nodeId,
      originalName: file.originalName,
      bytes: file.bytes,
      sourceSignature: decision.result.sourceSignature,
      store,
    });
    return presentNeedsMapping(upload, decision.result, decision.rememberedProblem);
  }

  const { reading } = decision;
  const storageKey = `${actor.workshopId}/${kase.id}/${randomUUID()}`;
  await store.put(storageKey, file.bytes, 'text/plain');
  try {
    const { log, attachment } = await storeTemperatureLog({
      actor,
      caseId: kase.id,
      nodeId,
      file: { originalName: file.originalName, byteSize: file.bytes.length, storageKey },
      series: reading.series,
      mappingSource: reading.mappingSource,
      columns: reading.columns,
      remember: reading.mappingSource === 'confirmed',
    });
    return {
      status: 'stored',
      log: presentLogDetail({
        log,
        attachment,
        uploader,
        analysis: log.analysis,
        series: chartSeries(reading.series, {}),
      }),
    };
  } catch (error) {
    await store.remove(storageKey).catch(() => undefined);
    throw error;
  }
}
