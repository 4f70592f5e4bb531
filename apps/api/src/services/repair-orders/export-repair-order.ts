// One approved revision as a downloadable file: PDF for people, CSV of the lines for a
// repair-order system, JSON in Heatpath's documented format for integrations.
import type { RepairOrderFormat } from '@heatpath/contracts';
import type { FileStore } from '../../lib/storage/file-store';
import type { Actor } from '../../policies/permissions';
import { buildRepairOrder, repairOrderFilename } from './build-repair-order';
import { renderRepairOrderCsv } from './render-repair-order-csv';
import { renderRepairOrderPdf } from './render-repair-order-pdf';

export interface ExportedFile {
  filename: string;
  mediaType: string;
  content: Buffer;
}

export async function exportRepairOrder(options: {
  actor: Actor;
  caseId: string;
  revision?: number;
  format: RepairOrderFormat;
  store: FileStore;
}): Promise<ExportedFile> {
  const { document, photos } = await buildRepairOrder(options);
  switch (options.format) {
    case 'pdf':
      return {
        filename: repairOrderFilename(document, 'pdf'),
        mediaType: 'application/pdf',
        content: await renderRepairOrderPdf(document, photos, options.store),
      };
    case 'csv':
      return {
        filename: repairOrderFilename(document, 'csv'),
        mediaType: 'text/csv; charset=utf-8',
        content: Buffer.from(renderRepairOrderCsv(document), 'utf8'),
      };
    case 'json':
      return {
        filename: repairOrderFilename(document, 'json'),
        mediaType: 'application/json; charset=utf-8',
        content: Buffer.from(`${JSON.stringify(document, null, 2)}\n`, 'utf8'),
      };
  }
}
