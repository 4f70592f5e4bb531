// Uploads waiting for their column mapping. The file goes to storage first and the row is written
// after it (a failed row removes the file), so a pending upload never points at nothing. They are
// kept for a day and at most five per case; older ones are removed when the workshop next uploads.
import { randomUUID } from 'node:crypto';
import { Op } from 'sequelize';
import { TemperatureLogUpload } from '../../db/models/index';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import type { Actor } from '../../policies/permissions';

export const pendingUploadLimits = { maxAgeHours: 24, maxPerCase: 5 } as const;

async function discard(uploads: TemperatureLogUpload[], store: FileStore): Promise<void> {
  if (uploads.length === 0) return;
  // Rows first: a file without a row is harmless, a row without its file is not.
  await TemperatureLogUpload.destroy({ where: { id: uploads.map((u) => u.id) } });
  await Promise.all(uploads.map((u) => store.remove(u.storageKey).catch(() => undefined)));
}

export async function discardExpiredUploads(options: {
  actor: Actor;
  store: FileStore;
}): Promise<void> {
  const cutoff = new Date(Date.now() - pendingUploadLimits.maxAgeHours * 3600_000);
  const expired = await TemperatureLogUpload.findAll({
    where: { workshopId: options.actor.workshopId, createdAt: { [Op.lt]: cutoff } },
    order: [['createdAt', 'ASC']],
    limit: 20,
  });
  await discard(expired, options.store);
}

export async function keepPendingUpload(options: {
  actor: Actor;
  caseId: string;
  nodeId: string | null;
  originalName: string;
  bytes: Buffer;
  sourceSignature: string;
  store: FileStore;
}): Promise<TemperatureLogUpload> {
  const { actor, caseId, store } = options;
  const id = randomUUID();
  const storageKey = `${actor.workshopId}/${caseId}/${id}`;
  await store.put(storageKey, options.bytes, 'text/plain');
  let upload: TemperatureLogUpload;
  try {
    upload = await TemperatureLogUpload.create({
      id,
      workshopId: actor.workshopId,
      caseId,
      nodeId: options.nodeId,
      storageKey,
      originalName: options.originalName.slice(0, 255),
      byteSize: options.bytes.length,
      sourceSignature: options.sourceSignature,
      uploadedBy: actor.userId,
    });
  } catch (error) {
    await store.remove(storageKey).catch(() => undefined);
    throw error;
  }
  const older = await TemperatureLogUpload.findAll({
    where: { caseId, workshopId: actor.workshopId },
    order: [['createdAt', 'DESC']],
    offset: pendingUploadLimits.maxPerCase,
  });
  await discard(older, store);
  return upload;
}

export async function findPendingUpload(options: {
  actor: Actor;
  caseId: string;
  uploadId: string;
}): Promise<TemperatureLogUpload> {
  const { actor, caseId, uploadId } = options;
  const upload = await TemperatureLogUpload.findOne({
    where: { id: uploadId, caseId, workshopId: actor.workshopId },
  });
  if (!upload) {
    throw new AppError(
      'not_found',
      'That upload is no longer waiting for its columns: it was finished, or it expired after a day. Upload the file again.',
    );
  }
  return upload;
}
