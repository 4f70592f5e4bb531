// Keeps the findings as they now stand as an immutable revision: who saved it and when. Called
// after every write that changes a case's findings, in the same transaction.
import { isDeepStrictEqual } from 'node:util';
import type { Transaction } from 'sequelize';
import { FindingsRevision } from '../../db/models/index';
import type { Finding } from '../../db/models/index';

export async function recordFindingsRevision(options: {
  finding: Finding;
  savedBy: string | null;
  transaction: Transaction;
}): Promise<FindingsRevision> {
  const { finding, transaction } = options;
  return FindingsRevision.create(
    {
      findingId: finding.id,
      caseId: finding.caseId,
      workshopId: finding.workshopId,
      revision: finding.revision,
      outcomeNodeId: finding.outcomeNodeId,
      concern: finding.concern,
      cause: finding.cause,
      correction: finding.correction,
      parts: finding.parts,
      labour: finding.labour,
      followUps: finding.followUps,
      readings: finding.readings,
      photoIds: finding.photoIds ?? [],
      savedBy: options.savedBy,
    },
    { transaction },
  );
}

export const sameReadings = (a: unknown, b: unknown): boolean => isDeepStrictEqual(a, b);
