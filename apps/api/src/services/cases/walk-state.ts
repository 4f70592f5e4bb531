// A case's walk, rebuilt from its stored events on its pinned tree version. Never kept in memory
// between requests: every process answers from the database.
import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import { summariseWalk } from '@heatpath/fault-tree';
import type { WalkSummary } from '@heatpath/fault-tree';
import { CaseEvent } from '../../db/models/index';
import type { DiagnosticCase } from '../../db/models/index';
import { compiledTreeOf } from '../../lib/compiled-trees';

/** The start node of a definition as stored (used before any event exists). */
export function startNodeOf(definition: unknown): string | null {
  const start = (definition as { start?: unknown } | null)?.start;
  return typeof start === 'string' ? start : null;
}

/** The walk events of a case in order, as the fault-tree package replays them. */
export async function walkEventsOf(caseId: string, transaction?: Transaction): Promise<unknown[]> {
  const rows = await CaseEvent.findAll({
    where: { caseId, kind: { [Op.in]: ['answer', 'back'] } },
    order: [['seq', 'ASC']],
    attributes: ['payload'],
    transaction,
  });
  return rows.map((row) => row.payload.event);
}

/**
 * One read of a case's history for an answer: the walk events in order, and where an event with
 * this idempotency key is already stored — its index among the walk events, or "other" when the
 * key was used for something else (a note), since keys are unique per case.
 */
export async function walkEventsAndKey(
  caseId: string,
  idempotencyKey: string,
  transaction: Transaction,
): Promise<{ events: unknown[]; keyed: number | 'other' | null }> {
  const rows = (await CaseEvent.findAll({
    where: { caseId },
    order: [['seq', 'ASC']],
    attributes: ['kind', 'payload', 'idempotencyKey'],
    raw: true,
    transaction,
  })) as unknown as { kind: string; payload: { event?: unknown }; idempotencyKey: string | null }[];
  const walkRows = rows.filter((r) => r.kind === 'answer' || r.kind === 'back');
  const index = walkRows.findIndex((r) => r.idempotencyKey === idempotencyKey);
  const elsewhere = rows.some((r) => r.idempotencyKey === idempotencyKey);
  return {
    events: walkRows.map((r) => r.payload.event),
    keyed: index >= 0 ? index : elsewhere ? 'other' : null,
  };
}

export async function walkOf(
  kase: DiagnosticCase,
  transaction?: Transaction,
): Promise<WalkSummary> {
  if (!kase.treeVersion) throw new Error('walkOf needs the tree version loaded.');
  const tree = compiledTreeOf(kase.treeVersion);
  return summariseWalk(tree, await walkEventsOf(kase.id, transaction));
}
