// Invented evidence for scripted walks: a small JPEG (a grey frame with a teal band, drawn with
// sharp) where a step requires a photo, a short CSV warm-up log where it requires a log. The
// demo seed and API tests attach these before answering such a step, as a technician would.
import { unmetEvidence } from '@heatpath/contracts';
import type { EvidenceRequest, TreeNode } from '@heatpath/fault-tree';
import sharp from 'sharp';

export interface EvidenceFile {
  originalName: string;
  mediaType: string;
  bytes: Buffer;
}

/** The evidence a step requires before it may be answered (none for most steps). */
export function requiredEvidence(node: TreeNode & { id: string }): EvidenceRequest[] {
  return unmetEvidence(node, node.id, []);
}

let photo: Promise<Buffer> | null = null;

/** A small invented JPEG: a grey frame with a teal band across it (drawn once, then reused). */
export function evidencePhoto(): Promise<Buffer> {
  photo ??= drawPhoto();
  return photo;
}

async function drawPhoto(): Promise<Buffer> {
  const band = await sharp({
    create: { width: 160, height: 24, channels: 3, background: { r: 11, g: 90, b: 81 } },
  })
    .png()
    .toBuffer();
  return sharp({
    create: { width: 160, height: 120, channels: 3, background: { r: 120, g: 124, b: 128 } },
  })
    .composite([{ input: band, top: 48, left: 0 }])
    .jpeg({ quality: 70 })
    .toBuffer();
}

/** A short invented scan-tool log of a warm-up: seconds, coolant and ambient in °C. */
export function evidenceLog(): Buffer {
  const rows = [0, 120, 240, 360, 480, 600, 720, 840, 960].map(
    (s, i) => `${s},${Math.min(21 + i * 9, 91)},14`,
  );
  return Buffer.from(['time_s,coolant_c,ambient_c', ...rows, ''].join('\n'));
}

/** A file meeting `request`, named after the step. */
export async function evidenceFile(
  request: Pick<EvidenceRequest, 'kind'>,
  nodeId: string,
): Promise<EvidenceFile> {
  return request.kind === 'photo'
    ? { originalName: `${nodeId}.jpg`, mediaType: 'image/jpeg', bytes: await evidencePhoto() }
    : { originalName: `${nodeId}.csv`, mediaType: 'text/csv', bytes: evidenceLog() };
}
