// Readings an answer carried, put back into their step's boxes (lib/reading-drafts): used when a
// step back undoes a measurement and when held answers are answered again.
import type { MeasurementAnswer } from '@heatpath/fault-tree';
import { readingDraftId, saveReadingDraft } from '../../lib/reading-drafts';

export function keepReadingsForStep(caseId: string, answer: MeasurementAnswer): void {
  const readings = Object.entries(answer.readings);
  saveReadingDraft(readingDraftId(caseId, answer.nodeId), {
    values: Object.fromEntries(readings.map(([name, reading]) => [name, String(reading.value)])),
    units: Object.fromEntries(readings.map(([name, reading]) => [name, reading.unit])),
  });
}
