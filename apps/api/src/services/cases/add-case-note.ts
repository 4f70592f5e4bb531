// A free note on a case or one of its steps, kept in the case's history with who and when.
import type { AddNoteRequest } from '@heatpath/contracts';
import { CaseEvent } from '../../db/models/index';
import { withTransaction } from '../../db/with-transaction';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { appendCaseEvent } from './append-case-event';
import { findCase } from './find-case';

export async function addCaseNote(options: {
  actor: Actor;
  caseId: string;
  input: AddNoteRequest;
}) {
  const { actor, caseId, input } = options;
  assertCan(actor, 'cases.walk');
  return withTransaction(async (transaction) => {
    const kase = await findCase({ actor, caseId, transaction, lock: true });
    const earlier = await CaseEvent.findOne({
      where: { caseId: kase.id, idempotencyKey: input.idempotencyKey },
      transaction,
    });
    if (earlier) {
      const text = (earlier.payload as { text?: unknown }).text;
      const same =
        earlier.kind === 'note' &&
        text === input.text &&
        (earlier.nodeId ?? null) === (input.nodeId ?? null);
      if (!same) {
        throw new AppError(
          'conflict',
          'This request repeats an earlier one (the same idempotency key) with a different note. The earlier note is kept; send a new note as a new request.',
        );
      }
      return earlier;
    }
    return appendCaseEvent({
      actor,
      kase,
      kind: 'note',
      nodeId: input.nodeId ?? null,
      payload: { text: input.text },
      idempotencyKey: input.idempotencyKey,
      transaction,
    });
  });
}
