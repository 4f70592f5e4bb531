// A case as its page shows it, and the walk requests. The walk's own shape belongs to the
// fault-tree package (the browser runs the same code), so it is referenced, not re-typed.
import { z } from 'zod';
import type { WalkSummary } from '@heatpath/fault-tree';
import type { CaseStatus } from './cases';
import type { Findings } from './findings';
import type { Customer, Vehicle } from './vehicles';

export const idempotencyKeySchema = z
  .string({ error: 'Send an idempotency key with every answer.' })
  .min(8, 'An idempotency key has at least 8 characters.')
  .max(100);

/** POST /api/cases/:caseId/walk — the event is checked by the fault-tree package itself. */
export const walkEventRequestSchema = z.object({
  idempotencyKey: idempotencyKeySchema,
  event: z.record(z.string(), z.unknown(), { error: 'Send the answer as an object.' }),
});
export type WalkEventRequest = z.infer<typeof walkEventRequestSchema>;

export const addNoteRequestSchema = z.object({
  idempotencyKey: idempotencyKeySchema,
  nodeId: z.string().max(80).nullish(),
  text: z
    .string()
    .trim()
    .min(1, 'Write the note first.')
    .max(4000, 'Keep a note under 4000 characters.'),
});
export type AddNoteRequest = z.infer<typeof addNoteRequestSchema>;

export interface PersonRef {
  id: string;
  name: string;
}

export interface CaseNote {
  id: string;
  nodeId: string | null;
  text: string;
  author: PersonRef;
  createdAt: string;
}

export interface CaseAttachment {
  id: string;
  nodeId: string | null;
  kind: 'photo' | 'file' | 'log';
  name: string;
  mediaType: string;
  byteSize: number;
  width: number | null;
  height: number | null;
  url: string;
  thumbnailUrl: string | null;
  uploadedBy: PersonRef;
  createdAt: string;
}

export interface CaseAuditEntry {
  seq: number;
  kind: string;
  nodeId: string | null;
  summary: string;
  actor: PersonRef;
  createdAt: string;
}

export interface CaseDetail {
  id: string;
  number: number;
  reference: string;
  status: CaseStatus;
  complaint: string;
  symptom: string;
  mileageAtIntake: number | null;
  mileageUnit: 'km' | 'mi';
  vehicle: Vehicle;
  customer: Customer | null;
  assignee: PersonRef | null;
  createdAt: string;
  updatedAt: string;
  diagnosedAt: string | null;
  tree: { treeId: string; versionId: string; version: number; title: string; definition: unknown };
  walk: WalkSummary;
  notes: CaseNote[];
  attachments: CaseAttachment[];
  findings: Findings | null;
  /** What the signed-in person may do with this case. */
  can: { walk: boolean; editFindings: boolean; markDiagnosed: boolean };
}

export interface WalkEventResponse {
  walk: WalkSummary;
  repeated: boolean;
}
