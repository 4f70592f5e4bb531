// The parts and labour lines of a repair order as CSV, one line per row, for importing into a
// workshop's repair-order or accounts system. Columns: repairOrderCsvColumns (see
// docs/repair-order-export.md). A text cell that a spreadsheet would run as a formula gets a
// leading apostrophe.
import { stringify } from 'csv-stringify/sync';
import { repairOrderCsvColumns } from '@heatpath/contracts';
import type { RepairOrderExport } from '@heatpath/contracts';

const formulaStart = /^[=+@\t\r]/;
const safeText = (text: string) => (formulaStart.test(text) ? `'${text}` : text);

export function renderRepairOrderCsv(document: RepairOrderExport): string {
  const reference = document.case.reference;
  const revision = document.findings.revision;
  const rows = [
    ...document.parts.map((p) => [
      reference,
      revision,
      'part',
      p.line,
      safeText(p.description),
      p.quantity,
      p.partNumber ? safeText(p.partNumber) : '',
      '',
    ]),
    ...document.labour.map((l) => [
      reference,
      revision,
      'labour',
      l.line,
      safeText(l.operation),
      '',
      '',
      l.hours,
    ]),
  ];
  return stringify(rows, {
    header: true,
    columns: [...repairOrderCsvColumns],
    record_delimiter: '\r\n',
  });
}
