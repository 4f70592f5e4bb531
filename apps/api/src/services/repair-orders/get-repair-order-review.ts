// The repair-order screen for one diagnosed case: every revision of its findings, the photos
// to choose from, and each e-mail sent with it.
import { FindingsRevision, OutboxMessage, User, Attachment } from '../../db/models/index';
import { presentRepairOrderReview } from '../../presenters/repair-order.presenter';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { loadRepairOrderCase } from './load-repair-order';

export async function getRepairOrderReview(options: { actor: Actor; caseId: string }) {
  const { actor } = options;
  assertCan(actor, 'findings.review');
  const order = await loadRepairOrderCase(options);
  const scope = { caseId: order.kase.id, workshopId: actor.workshopId };
  const [revisions, photos, sends] = await Promise.all([
    FindingsRevision.findAll({
      where: scope,
      include: [
        { model: User, as: 'saver' },
        { model: User, as: 'approver' },
      ],
      order: [['revision', 'ASC']],
    }),
    Attachment.findAll({ where: { ...scope, kind: 'photo' }, order: [['createdAt', 'ASC']] }),
    OutboxMessage.findAll({
      where: { ...scope, kind: 'repair-order' },
      include: [{ model: User, as: 'creator' }],
      order: [['createdAt', 'DESC']],
    }),
  ]);
  return presentRepairOrderReview({ order, revisions, photos, sends, actor });
}
