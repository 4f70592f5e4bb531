// The column mapping a workshop confirmed for a source of logs, kept under the parser's source
// signature so the next export from the same scan tool or logger reads without asking.
import { randomUUID } from 'node:crypto';
import type { ResolvedMapping } from '@heatpath/temperature-log';
import type { Transaction } from 'sequelize';
import { TemperatureLogMapping } from '../../db/models/index';
import { database } from '../../db/with-transaction';
import type { Actor } from '../../policies/permissions';

export async function findRememberedMapping(options: {
  actor: Actor;
  sourceSignature: string;
}): Promise<ResolvedMapping | null> {
  const row = await TemperatureLogMapping.findOne({
    where: { workshopId: options.actor.workshopId, sourceSignature: options.sourceSignature },
  });
  return row?.mapping ?? null;
}

export async function rememberMapping(options: {
  actor: Actor;
  sourceSignature: string;
  mapping: ResolvedMapping;
  transaction: Transaction;
}): Promise<void> {
  const { actor, sourceSignature, mapping, transaction } = options;
  // One row per workshop and source: a later confirmation replaces the earlier one.
  await database().query(
    `INSERT INTO temperature_log_mappings
       (id, workshop_id, source_signature, mapping, confirmed_by, created_at, updated_at)
     VALUES (:id, :workshopId, :sourceSignature, :mapping, :userId, now(), now())
     ON CONFLICT (workshop_id, source_signature)
     DO UPDATE SET mapping = EXCLUDED.mapping, confirmed_by = EXCLUDED.confirmed_by,
                   updated_at = now()`,
    {
      replacements: {
        id: randomUUID(),
        workshopId: actor.workshopId,
        sourceSignature,
        mapping: JSON.stringify(mapping),
        userId: actor.userId,
      },
      transaction,
    },
  );
}

/** Two mappings read the file the same way (unmapped channels may be absent or null). */
export function sameMapping(a: ResolvedMapping, b: ResolvedMapping): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]) as Set<keyof ResolvedMapping>;
  for (const key of keys) {
    if ((a[key] ?? null) !== (b[key] ?? null)) return false;
  }
  return true;
}
