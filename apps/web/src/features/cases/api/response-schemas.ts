// Shapes the cases API returns that the contracts package declares as TypeScript interfaces only
// (the walk belongs to the fault-tree package and is typed, not re-described, there). The web app
// must not re-type them, so these check only what the screens cannot work without and otherwise
// trust the interface; a broken answer still becomes the client's "not understood" error.
import type {
  CaseAttachment,
  CaseAuditEntry,
  CaseDetail,
  CaseNote,
  WalkEventResponse,
} from '@heatpath/contracts';
import { z } from 'zod';

function hasFields(value: unknown, fields: readonly string[]): boolean {
  return (
    typeof value === 'object' &&
    value !== null &&
    fields.every((field) => Object.hasOwn(value, field))
  );
}

function hasWalk(value: unknown): boolean {
  return (
    hasFields(value, ['walk']) &&
    hasFields((value as { walk: unknown }).walk, ['currentNode', 'history', 'position'])
  );
}

export const caseDetailSchema = z.custom<CaseDetail>(
  (value) => hasFields(value, ['id', 'reference', 'tree', 'can', 'notes']) && hasWalk(value),
);

export const walkEventResponseSchema = z.custom<WalkEventResponse>(hasWalk);

export const caseNoteSchema = z.custom<CaseNote>((value) => hasFields(value, ['id', 'text']));

export const caseAttachmentSchema = z.custom<CaseAttachment>((value) =>
  hasFields(value, ['id', 'url', 'thumbnailUrl']),
);

export const caseEventsSchema = z.custom<{ events: CaseAuditEntry[] }>(
  (value) => hasFields(value, ['events']) && Array.isArray((value as { events: unknown }).events),
);
