// Readings typed into a measurement step and not yet answered, kept in the tablet's localStorage
// so a reload (or a step back, which writes the readings it undoes) finds the boxes filled. One
// draft per case and step. Storage can be missing or full (private browsing) and a stored draft
// can be anything: then there is simply no draft, never an error on the step.
import { unitCodes, type UnitCode } from '@heatpath/fault-tree';
import { z } from 'zod';

export interface ReadingDraft {
  values: Record<string, string>;
  units: Record<string, UnitCode>;
}

const draftSchema = z.object({
  values: z.record(z.string(), z.string()).catch({}),
  units: z.record(z.string(), z.string()).catch({}),
});

const knownUnits: ReadonlySet<string> = new Set(unitCodes);

const prefix = 'heatpath:reading-draft:';

export function readingDraftId(caseId: string, nodeId: string): string {
  return `${prefix}${caseId}:${nodeId}`;
}

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null;
  }
}

export function loadReadingDraft(id: string): ReadingDraft | null {
  try {
    const text = storage()?.getItem(id);
    if (!text) return null;
    const parsed = draftSchema.safeParse(JSON.parse(text));
    if (!parsed.success) return null;
    const units = Object.fromEntries(
      Object.entries(parsed.data.units).filter(([, unit]) => knownUnits.has(unit)),
    ) as Record<string, UnitCode>;
    return { values: parsed.data.values, units };
  } catch {
    return null;
  }
}

export function saveReadingDraft(id: string, draft: ReadingDraft): void {
  try {
    storage()?.setItem(id, JSON.stringify({ values: draft.values, units: draft.units }));
  } catch {
    // Full or refused storage: the readings stay on the screen, only a reload would lose them.
  }
}

export function clearReadingDraft(id: string): void {
  try {
    storage()?.removeItem(id);
  } catch {
    // Nothing stored that could be removed.
  }
}
