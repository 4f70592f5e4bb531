// Drafts a case's findings when its walk reaches an outcome: the complaint as the concern, the
// outcome's root cause with the readings that led there as the cause, and the outcome's
// correction, parts, labour and follow-ups. An edited draft for the same outcome is kept.
import type { Transaction } from 'sequelize';
import type { WalkSummary } from '@heatpath/fault-tree';
import { Finding } from '../../db/models/index';
import type { DiagnosticCase } from '../../db/models/index';
import { recordFindingsRevision, sameReadings } from './record-findings-revision';

export function causeText(walk: WalkSummary): string {
  if (!walk.outcome) return '';
  const readings = walk.readings.map((r) => `${r.label}: ${r.display}`);
  const computed = walk.computed
    .filter((c) => c.display !== null)
    .map((c) => `${c.label}: ${c.display}`);
  const evidence = [...readings, ...computed];
  return evidence.length
    ? `${walk.outcome.rootCause}\n\nReadings on the way there: ${evidence.join('; ')}.`
    : walk.outcome.rootCause;
}

export async function draftFindings(options: {
  kase: DiagnosticCase;
  walk: WalkSummary;
  actorId: string;
  transaction: Transaction;
}): Promise<Finding | null> {
  const { kase, walk, actorId, transaction } = options;
  const outcome = walk.outcome;
  if (!outcome) return null;
  const draft = {
    outcomeNodeId: outcome.id,
    concern: kase.complaint,
    cause: causeText(walk),
    correction: outcome.correction,
    parts: outcome.parts.map((p) => ({
      description: p.description,
      quantity: p.quantity,
      partNumber: null,
    })),
    labour: outcome.labour.map((l) => ({ operation: l.operation, hours: l.hours })),
    followUps: [...outcome.followUps],
    readings: walk.readings.map((r) => ({
      nodeId: r.nodeId,
      label: r.label,
      value: r.canonical.value,
      unit: r.canonical.unit,
    })),
  };
  const existing = await Finding.findOne({
    where: { caseId: kase.id },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  // Every change is also kept as a revision (see record-findings-revision.ts).
  const keep = async (finding: Finding) => {
    await recordFindingsRevision({ finding, savedBy: actorId, transaction });
    return finding;
  };
  if (!existing) {
    return keep(
      await Finding.create(
        { ...draft, caseId: kase.id, workshopId: kase.workshopId, updatedBy: actorId },
        { transaction },
      ),
    );
  }
  if (existing.outcomeNodeId === outcome.id) {
    // Same outcome reached again (after a step back): keep the technician's edits, refresh readings.
    if (sameReadings(existing.readings, draft.readings)) return existing;
    return keep(
      await existing.update(
        { readings: draft.readings, revision: existing.revision + 1, updatedBy: actorId },
        { transaction },
      ),
    );
  }
  return keep(
    await existing.update(
      { ...draft, photoIds: [], revision: existing.revision + 1, updatedBy: actorId },
      { transaction },
    ),
  );
}
