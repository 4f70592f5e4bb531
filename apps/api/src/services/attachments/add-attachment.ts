// Stores an uploaded photo or file for a case (or one of its steps). The content is sniffed,
// never trusted from the name or the browser; bytes are stored first and the row written last,
// and a failure removes what was stored, so no record ever points at a missing file.
// An upload may carry an idempotency key (a tablet's queue sends one): the same key with the
// same content again gets the stored attachment back; with other content it is refused.
import { createHash, randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { Attachment, User } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import type { FileStore } from '../../lib/storage/file-store';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from '../cases/append-case-event';
import { findCase } from '../cases/find-case';

export const attachmentLimits = {
  maxBytes: 12 * 1024 * 1024,
  maxPerCase: 60,
  // 50 megapixels: above the 48–50 MP of the largest phone and camera photos a workshop takes
  // (12 MP is the usual), and at 4 bytes a pixel a 200 MB decode at most. A few kilobytes of
  // compressed PNG can claim 40000 × 40000 pixels; such a file is refused from its header
  // before any pixel is decoded.
  maxPixels: 50_000_000,
} as const;

const imageTypes = new Set(['image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/avif']);
const documentTypes = new Set(['application/pdf']);
const textExtensions = /\.(csv|txt|log|tsv)$/i;

export interface UploadedFile {
  originalName: string;
  bytes: Buffer;
}

function isUtf8(bytes: Buffer): boolean {
  try {
    // stream: a multi-byte character cut at the end of the sample is not an error.
    new TextDecoder('utf-8', { fatal: true }).decode(bytes, { stream: true });
    return true;
  } catch {
    return false;
  }
}

async function sniff(file: UploadedFile): Promise<{ mediaType: string; isImage: boolean }> {
  const detected = await fileTypeFromBuffer(file.bytes);
  if (detected) {
    if (imageTypes.has(detected.mime)) return { mediaType: detected.mime, isImage: true };
    if (documentTypes.has(detected.mime)) return { mediaType: detected.mime, isImage: false };
    throw new AppError(
      'unsupported_media_type',
      `Files of type ${detected.mime} cannot be attached. Attach a photo (JPEG, PNG, WebP, HEIC), a PDF, or a CSV or text log.`,
    );
  }
  // No magic number: accept only genuine text (a data-logger export), judged by its content.
  const sample = file.bytes.subarray(0, 64 * 1024);
  const looksText = textExtensions.test(file.originalName) && !sample.includes(0) && isUtf8(sample);
  if (looksText) return { mediaType: 'text/plain', isImage: false };
  throw new AppError(
    'unsupported_media_type',
    'That file’s content is not a photo, PDF or text log, whatever its name says.',
  );
}

/** Reads only the image's header: its claimed size is checked before anything is decoded. */
async function assertDecodableSize(bytes: Buffer): Promise<void> {
  const size = await sharp(bytes, { limitInputPixels: false })
    .metadata()
    .then((meta) => ({
      width: meta.width ?? 0,
      height: meta.pageHeight && meta.pages ? meta.pageHeight * meta.pages : (meta.height ?? 0),
    }))
    .catch(() => {
      throw new AppError(
        'unsupported_media_type',
        'That image could not be read; it may be damaged.',
      );
    });
  const { width, height } = size;
  if (width * height > attachmentLimits.maxPixels) {
    const megapixels = Math.round((width * height) / 1_000_000);
    throw new AppError(
      'payload_too_large',
      `This image is ${width} × ${height} pixels (${megapixels} megapixels); Heatpath takes photos up to ${attachmentLimits.maxPixels / 1_000_000} megapixels. Send it at a smaller size.`,
    );
  }
}

async function removeAll(store: FileStore, keys: readonly string[]): Promise<void> {
  await Promise.all(keys.map((k) => store.remove(k).catch(() => undefined)));
}

export interface AddedAttachment {
  attachment: Attachment;
  /** For a repeat, who sent it first; null for a new upload (the caller). */
  uploader: User | null;
  /** True when the idempotency key had been used before: nothing new was stored. */
  repeated: boolean;
}

/**
 * The attachment already stored under `key` for this case, if any; a different file under the
 * same key (another size or SHA-256) is refused.
 */
async function storedUnderKey(
  caseId: string,
  key: string,
  file: { byteSize: number; sha256: string },
  transaction?: Transaction,
): Promise<AddedAttachment | null> {
  const existing = await Attachment.findOne({
    where: { caseId, idempotencyKey: key },
    include: [{ model: User, as: 'uploader' }],
    transaction,
  });
  if (!existing) return null;
  if (existing.byteSize !== file.byteSize || existing.sha256 !== file.sha256) {
    throw new AppError(
      'conflict',
      'This upload repeats an earlier one (the same idempotency key) with a different file. The earlier file is kept; send the new file as a new upload.',
    );
  }
  const uploader = (existing as Attachment & { uploader?: User | null }).uploader ?? null;
  return { attachment: existing, uploader, repeated: true };
}

export async function addAttachment(options: {
  actor: Actor;
  caseId: string;
  nodeId: string | null;
  photoOnly: boolean;
  file: UploadedFile;
  store: FileStore;
  /** The sender's key for this upload; the same key again returns the stored attachment. */
  idempotencyKey?: string | null;
}): Promise<AddedAttachment> {
  const { actor, caseId, nodeId, file, store } = options;
  const key = options.idempotencyKey ?? null;
  assertCan(actor, 'cases.walk');
  const kase = await findCase({ actor, caseId });
  if (file.bytes.length === 0) throw new AppError('bad_request', 'The file is empty.');
  const content = {
    byteSize: file.bytes.length,
    sha256: createHash('sha256').update(file.bytes).digest('hex'),
  };
  if (key !== null) {
    const repeat = await storedUnderKey(kase.id, key, content);
    if (repeat) return repeat;
  }
  if (file.bytes.length > attachmentLimits.maxBytes) {
    throw new AppError(
      'payload_too_large',
      `A file can be at most ${attachmentLimits.maxBytes / 1024 / 1024} MB.`,
    );
  }
  const { mediaType, isImage } = await sniff(file);
  if (options.photoOnly && !isImage) {
    throw new AppError(
      'unsupported_media_type',
      'This step asks for a photo: attach a JPEG, PNG, WebP or HEIC image.',
    );
  }

  if (isImage && mediaType !== 'image/heic') await assertDecodableSize(file.bytes);

  const id = randomUUID();
  const storageKey = `${actor.workshopId}/${kase.id}/${id}`;
  let thumbnailKey: string | null = null;
  let width: number | null = null;
  let height: number | null = null;
  const stored: string[] = [];
  try {
    await store.put(storageKey, file.bytes, mediaType);
    stored.push(storageKey);
    if (isImage && mediaType !== 'image/heic') {
      const image = sharp(file.bytes, {
        failOn: 'error',
        limitInputPixels: attachmentLimits.maxPixels,
      }).rotate();
      const meta = await image.metadata();
      width = meta.autoOrient?.width ?? meta.width ?? null;
      height = meta.autoOrient?.height ?? meta.height ?? null;
      const thumb = await image
        .resize(360, 360, { fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 72 })
        .toBuffer();
      thumbnailKey = `${storageKey}.thumb.webp`;
      await store.put(thumbnailKey, thumb, 'image/webp');
      stored.push(thumbnailKey);
    }
    const added = await withTransaction(async (transaction): Promise<AddedAttachment> => {
      const locked = await findCase({ actor, caseId, transaction, lock: true });
      // Two sends of one key at once: the second waits for the case lock, then finds the first.
      if (key !== null) {
        const repeat = await storedUnderKey(locked.id, key, content, transaction);
        if (repeat) return repeat;
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
          id,
          caseId: locked.id,
          workshopId: actor.workshopId,
          nodeId,
          kind: isImage ? 'photo' : mediaType === 'text/plain' ? 'log' : 'file',
          storageKey,
          thumbnailKey,
          originalName: file.originalName.slice(0, 255),
          mediaType,
          byteSize: file.bytes.length,
          width,
          height,
          uploadedBy: actor.userId,
          idempotencyKey: key,
          sha256: key === null ? null : content.sha256,
        },
        { transaction },
      );
      await appendCaseEvent({
        actor,
        kase: locked,
        kind: 'attachment',
        nodeId,
        payload: { attachmentId: attachment.id, name: attachment.originalName },
        transaction,
      });
      return { attachment, uploader: null, repeated: false };
    });
    // A repeat found under the lock keeps the first upload's bytes; this one's are not needed.
    if (added.repeated) await removeAll(store, stored);
    return added;
  } catch (error) {
    await removeAll(store, stored);
    if (error instanceof Error && /pixel limit/i.test(error.message)) {
      throw new AppError(
        'payload_too_large',
        `That image is larger than ${attachmentLimits.maxPixels / 1_000_000} megapixels; send it at a smaller size.`,
      );
    }
    if (error instanceof Error && /unsupported image format|Input buffer/i.test(error.message)) {
      throw new AppError(
        'unsupported_media_type',
        'That image could not be read; it may be damaged.',
      );
    }
    throw error;
  }
}
