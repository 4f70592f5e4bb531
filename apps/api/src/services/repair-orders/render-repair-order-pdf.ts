// The repair order as a PDF a customer can read: one or two A4 pages in Heatpath's own look and
// its font (IBM Plex Sans, embedded from @fontsource's WOFF files), with the workshop's name,
// the case, vehicle and customer, concern / cause / correction, the parts and labour lines,
// follow-ups with their cautions, the key readings and the chosen photos (JPEG, scaled down).
import { createRequire } from 'node:module';
import type { Readable } from 'node:stream';
import PDFDocument from 'pdfkit';
import sharp from 'sharp';
import type { RepairOrderExport } from '@heatpath/contracts';
import type { FileStore } from '../../lib/storage/file-store';
import type { RepairOrderPhotoRef } from './build-repair-order';

const require = createRequire(import.meta.url);
const fontFile = (weight: number) =>
  require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-${weight}-normal.woff`);
const fonts = { regular: fontFile(400), semibold: fontFile(600), bold: fontFile(700) };

// Heatpath's light palette (docs/design.md), which prints well on white paper.
const colour = {
  ink: '#14181c',
  muted: '#3f464d',
  line: '#c9c3b6',
  primary: '#0b5a51',
  sunken: '#f3f1ea',
  cautionBg: '#ffefc2',
  cautionLine: '#8a5600',
  cautionInk: '#3a2500',
};

const page = { margin: 44, footer: 28 };

// The embedded font files are the Latin subset; anything outside it is spelled plainly rather
// than printed as an empty box.
const supported =
  /[\n\u0020-\u007e\u00a0-\u00ff\u0131\u0152\u0153\u02bb\u02bc\u02c6\u02da\u02dc\u2000-\u206f\u20ac\u2122\u2191\u2193\u2212\u2215]/u;
const spelled: Record<string, string> = { '→': '->', '←': '<-', '≥': '>=', '≤': '<=', '≈': '~' };
export function printable(text: string): string {
  let out = '';
  for (const ch of text) {
    if (supported.test(ch)) out += ch;
    else if (spelled[ch]) out += spelled[ch];
    else {
      const plain = ch.normalize('NFD').replace(/\p{M}/gu, '');
      out += [...plain].every((c) => supported.test(c)) && plain ? plain : '?';
    }
  }
  return out;
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long' });
const formatDate = (iso: string | null) => (iso ? dateFormat.format(new Date(iso)) : '—');
const formatNumber = (n: number) =>
  new Intl.NumberFormat('en-GB', { maximumFractionDigits: 2 }).format(n);

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
  return Buffer.concat(chunks);
}

/** Each chosen photo as a JPEG no larger than print needs, or null when it cannot be read. */
async function preparePhotos(photos: RepairOrderPhotoRef[], store: FileStore) {
  return Promise.all(
    photos.map(async (photo) => {
      try {
        const bytes = await readAll(await store.get(photo.storageKey));
        const jpeg = await sharp(bytes, { failOn: 'error' })
          .rotate()
          .resize(1000, 1000, { fit: 'inside', withoutEnlargement: true })
          .flatten({ background: '#ffffff' })
          .jpeg({ quality: 78, mozjpeg: true })
          .toBuffer({ resolveWithObject: true });
        return { ...photo, jpeg: jpeg.data, width: jpeg.info.width, height: jpeg.info.height };
      } catch {
        return { ...photo, jpeg: null, width: 0, height: 0 };
      }
    }),
  );
}

export async function renderRepairOrderPdf(
  document: RepairOrderExport,
  photos: RepairOrderPhotoRef[],
  store: FileStore,
): Promise<Buffer> {
  const images = await preparePhotos(photos, store);
  const { case: kase, vehicle, customer, findings } = document;
  const doc = new PDFDocument({
    size: 'A4',
    margins: {
      top: page.margin,
      bottom: page.margin + page.footer,
      left: page.margin,
      right: page.margin,
    },
    bufferPages: true,
    font: fonts.regular,
    lang: 'en-GB',
    displayTitle: true,
    info: {
      Title: `Repair order ${kase.reference}, revision ${findings.revision}`,
      Author: document.workshop.name,
      Subject: findings.outcome.title,
      Creator: 'Heatpath',
    },
  });
  doc.registerFont('regular', fonts.regular);
  doc.registerFont('semibold', fonts.semibold);
  doc.registerFont('bold', fonts.bold);
  const done = new Promise<Buffer>((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const left = page.margin;
  const width = doc.page.width - page.margin * 2;
  const bottom = () => doc.page.height - page.margin - page.footer;
  const ensure = (height: number) => {
    if (doc.y + height > bottom()) doc.addPage();
  };
  const text = (
    value: string,
    options: {
      font?: 'regular' | 'semibold' | 'bold';
      size?: number;
      color?: string;
      x?: number;
      y?: number;
    } & PDFKit.Mixins.TextOptions = {},
  ) => {
    const { font = 'regular', size = 10, color = colour.ink, x, y, ...rest } = options;
    return doc.font(font).fontSize(size).fillColor(color).text(printable(value), x, y, rest);
  };
  const heightOf = (value: string, font: string, size: number, w: number) =>
    doc.font(font).fontSize(size).heightOfString(printable(value), { width: w });
  // A heading never ends a page: it keeps at least `keepWith` points of what follows.
  const heading = (title: string, keepWith = 48) => {
    ensure(30 + keepWith);
    doc.moveDown(0.6);
    text(title, { font: 'bold', size: 12, color: colour.primary, x: left, width });
    const y = doc.y + 2;
    doc
      .moveTo(left, y)
      .lineTo(left + width, y)
      .lineWidth(0.75)
      .strokeColor(colour.line)
      .stroke();
    doc.y = y + 6;
  };

  // Header: the workshop, what this is, and which approved revision it is.
  text(document.workshop.name, { font: 'bold', size: 18, color: colour.primary, x: left, width });
  text(`Repair order findings · ${kase.reference} · revision ${findings.revision}`, {
    font: 'semibold',
    size: 11,
    x: left,
    width,
  });
  text(
    `Approved ${formatDate(findings.approvedAt)} by ${findings.approvedBy.name}. Diagnosed ${formatDate(kase.diagnosedAt)}.`,
    { size: 9.5, color: colour.muted, x: left, width },
  );
  doc.moveDown(0.4);
  doc.rect(left, doc.y, width, 2.5).fillColor(colour.primary).fill();
  doc.y += 10;

  // Three columns of facts: the vehicle, the customer, the diagnosis.
  const columns: { title: string; lines: string[] }[] = [
    {
      title: 'Vehicle',
      lines: [
        [vehicle.plate, `${vehicle.make} ${vehicle.model}`].filter(Boolean).join(' · '),
        vehicle.year ? `Model year ${vehicle.year}` : '',
        vehicle.vin ? `VIN ${vehicle.vin}` : '',
        vehicle.engine ?? '',
        vehicle.mileageAtIntake
          ? `${formatNumber(vehicle.mileageAtIntake.value)} ${vehicle.mileageAtIntake.unit} at intake`
          : '',
      ].filter(Boolean),
    },
    {
      title: 'Customer',
      lines: customer
        ? [customer.name, customer.phone ?? '', customer.email ?? ''].filter(Boolean)
        : ['Not recorded'],
    },
    {
      title: 'Diagnosis',
      lines: [
        `Technician: ${kase.technician?.name ?? 'not recorded'}`,
        `Case opened ${formatDate(kase.openedAt)}`,
        `Tree: ${document.tree.title}, version ${document.tree.version}`,
        `Finding: ${findings.outcome.title}`,
      ],
    },
  ];
  const gap = 14;
  const columnWidth = (width - gap * 2) / 3;
  const top = doc.y;
  let lowest = top;
  columns.forEach((column, i) => {
    const x = left + i * (columnWidth + gap);
    doc.y = top;
    text(column.title.toUpperCase(), {
      font: 'bold',
      size: 8,
      color: colour.muted,
      x,
      width: columnWidth,
      characterSpacing: 0.6,
    });
    for (const line of column.lines) text(line, { size: 9.5, x, width: columnWidth });
    lowest = Math.max(lowest, doc.y);
  });
  doc.x = left;
  doc.y = lowest + 4;

  // Concern, cause, correction: the three parts of the finding, each labelled in a margin.
  const labelWidth = 78;
  for (const [label, value] of [
    ['Concern', findings.concern],
    ['Cause', findings.cause],
    ['Correction', findings.correction],
  ] as const) {
    const h = heightOf(value, 'regular', 10, width - labelWidth);
    ensure(Math.min(h, 60) + 12);
    doc.moveDown(0.5);
    const y = doc.y;
    text(label, { font: 'bold', size: 10, color: colour.primary, x: left, width: labelWidth - 8 });
    doc.y = y;
    text(value, { size: 10, x: left + labelWidth, width: width - labelWidth, lineGap: 1 });
  }

  // A simple table: a shaded header row, then one row per line, breaking pages between rows.
  const table = (
    headers: { title: string; width: number; align?: 'left' | 'right' }[],
    rows: string[][],
  ) => {
    const pad = 4;
    const drawHeader = () => {
      const y = doc.y;
      doc.rect(left, y, width, 16).fillColor(colour.sunken).fill();
      let x = left;
      for (const h of headers) {
        doc.y = y + 3.5;
        text(h.title, {
          font: 'semibold',
          size: 8.5,
          color: colour.muted,
          x: x + pad,
          width: h.width - pad * 2,
          align: h.align ?? 'left',
        });
        x += h.width;
      }
      doc.y = y + 18;
    };
    ensure(40);
    drawHeader();
    for (const row of rows) {
      const rowHeight =
        Math.max(
          ...row.map((cell, i) =>
            heightOf(cell, 'regular', 9.5, (headers[i]?.width ?? 0) - pad * 2),
          ),
        ) + 6;
      if (doc.y + rowHeight > bottom()) {
        doc.addPage();
        drawHeader();
      }
      const y = doc.y;
      let x = left;
      row.forEach((cell, i) => {
        const h = headers[i];
        if (!h) return;
        doc.y = y + 3;
        text(cell, { size: 9.5, x: x + pad, width: h.width - pad * 2, align: h.align ?? 'left' });
        x += h.width;
      });
      doc.y = y + rowHeight;
      doc
        .moveTo(left, doc.y)
        .lineTo(left + width, doc.y)
        .lineWidth(0.5)
        .strokeColor(colour.line)
        .stroke();
    }
    doc.x = left;
  };

  heading('Parts');
  if (document.parts.length === 0) text('No parts.', { color: colour.muted, x: left, width });
  else
    table(
      [
        { title: '#', width: 24 },
        { title: 'Description', width: width - 24 - 130 - 60 },
        { title: 'Part number', width: 130 },
        { title: 'Quantity', width: 60, align: 'right' },
      ],
      document.parts.map((p) => [
        String(p.line),
        p.description,
        p.partNumber ?? '—',
        formatNumber(p.quantity),
      ]),
    );

  heading('Labour');
  if (document.labour.length === 0)
    text('No labour lines.', { color: colour.muted, x: left, width });
  else {
    table(
      [
        { title: '#', width: 24 },
        { title: 'Operation', width: width - 24 - 70 },
        { title: 'Hours', width: 70, align: 'right' },
      ],
      document.labour.map((l) => [String(l.line), l.operation, formatNumber(l.hours)]),
    );
    const total = document.labour.reduce((sum, l) => sum + l.hours, 0);
    doc.moveDown(0.2);
    text(`Total labour: ${formatNumber(total)} h`, {
      font: 'semibold',
      size: 9.5,
      x: left,
      width: width - 4,
      align: 'right',
    });
  }

  heading(
    'Follow-ups',
    document.followUps[0] ? heightOf(document.followUps[0], 'regular', 10, width - 18) : 48,
  );
  document.followUps.forEach((followUp, i) => {
    ensure(heightOf(followUp, 'regular', 10, width - 18) + 4);
    const y = doc.y;
    text(`${i + 1}.`, { font: 'semibold', size: 10, x: left, width: 16 });
    doc.y = y;
    text(followUp, { size: 10, x: left + 18, width: width - 18, lineGap: 1 });
    doc.moveDown(0.3);
  });
  // The standing caution for any follow-up that opens the cooling system.
  const caution =
    'Caution: hot coolant is under pressure and scalds. Never open the cap or a bleed screw on a hot system: let the engine cool first. Keep clear of the fan, which can start on its own. Follow the vehicle maker’s procedure.';
  const cautionHeight = heightOf(caution, 'semibold', 9.5, width - 24) + 14;
  ensure(cautionHeight + 6);
  doc.moveDown(0.3);
  const cy = doc.y;
  doc.rect(left, cy, width, cautionHeight).fillColor(colour.cautionBg).fill();
  doc.rect(left, cy, 4, cautionHeight).fillColor(colour.cautionLine).fill();
  doc.y = cy + 7;
  text(caution, {
    font: 'semibold',
    size: 9.5,
    color: colour.cautionInk,
    x: left + 14,
    width: width - 24,
  });
  doc.y = cy + cautionHeight;
  doc.x = left;

  if (document.readings.length > 0) {
    heading('Key readings');
    // Two readings to a row: a walk records a dozen or more, and the repair order stays short.
    const half = (width - 16) / 2;
    const rows: string[][] = [];
    for (let i = 0; i < document.readings.length; i += 2) {
      const [a, b] = [document.readings[i], document.readings[i + 1]];
      rows.push([a?.label ?? '', a?.display ?? '', '', b?.label ?? '', b?.display ?? '']);
    }
    table(
      [
        { title: 'Reading', width: half - 64 },
        { title: 'Value', width: 64, align: 'right' },
        { title: '', width: 16 },
        { title: 'Reading', width: half - 64 },
        { title: 'Value', width: 64, align: 'right' },
      ],
      rows,
    );
  }

  if (images.length > 0) {
    heading('Photos');
    const perRow = 3;
    const cell = (width - gap * (perRow - 1)) / perRow;
    const maxHeight = 124;
    for (let i = 0; i < images.length; i += perRow) {
      const row = images.slice(i, i + perRow);
      const heights = row.map((img) =>
        img.jpeg ? Math.min(maxHeight, (cell * img.height) / Math.max(1, img.width)) : 20,
      );
      const rowHeight = Math.max(...heights) + 18;
      ensure(rowHeight);
      const y = doc.y;
      row.forEach((img, j) => {
        const x = left + j * (cell + gap);
        if (img.jpeg) {
          doc.image(img.jpeg, x, y, { fit: [cell, maxHeight] });
        } else {
          doc.y = y;
          text('This photo could not be converted for print.', {
            size: 9,
            color: colour.muted,
            x,
            width: cell,
          });
        }
        doc.y = y + (heights[j] ?? 0) + 3;
        text(img.name, { size: 8.5, color: colour.muted, x, width: cell });
      });
      doc.y = y + rowHeight;
      doc.x = left;
    }
  }

  // Footer on every page: which repair order this is, and where it came from.
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const y = doc.page.height - page.margin - 10;
    doc
      .moveTo(left, y - 6)
      .lineTo(left + width, y - 6)
      .lineWidth(0.5)
      .strokeColor(colour.line)
      .stroke();
    // Written below the bottom margin on purpose: lift the margin so pdfkit adds no page.
    const margin = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    text(
      `${kase.reference} · revision ${findings.revision} · approved ${formatDate(findings.approvedAt)} · prepared with Heatpath`,
      { size: 8, color: colour.muted, x: left, y, width: width - 80, lineBreak: false },
    );
    text(`Page ${i - range.start + 1} of ${range.count}`, {
      size: 8,
      color: colour.muted,
      x: left + width - 80,
      y,
      width: 80,
      align: 'right',
      lineBreak: false,
    });
    doc.page.margins.bottom = margin;
  }
  doc.end();
  return done;
}
