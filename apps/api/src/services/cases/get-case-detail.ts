// Everything the case page shows, for one case of the caller's workshop.
import { Attachment, CaseEvent, Finding, User } from '../../db/models/index';
import { presentCaseDetail } from '../../presenters/case.presenter';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findCase } from './find-case';
import { walkOf } from './walk-state';

export async function getCaseDetail(options: { actor: Actor; caseId: string }) {
  const { actor, caseId } = options;
  assertCan(actor, 'cases.read');
  const kase = await findCase({ actor, caseId, withDetails: true });
  const [walk, notes, attachments, finding] = await Promise.all([
    walkOf(kase),
    CaseEvent.findAll({
      where: { caseId: kase.id, kind: 'note' },
      include: [{ model: User, as: 'actor' }],
      order: [['seq', 'ASC']],
    }),
    Attachment.findAll({
      where: { caseId: kase.id },
      include: [{ model: User, as: 'uploader' }],
      order: [['createdAt', 'ASC']],
    }),
    Finding.findOne({ where: { caseId: kase.id }, include: [{ model: User, as: 'editor' }] }),
  ]);
  return presentCaseDetail({
    kase,
    walk,
    notes,
    attachments: attachments.map((attachment) => ({
      attachment,
      uploader: (attachment as Attachment & { uploader?: User }).uploader,
    })),
    findings: finding
      ? { finding, editor: (finding as Finding & { editor?: User }).editor ?? null }
      : null,
    actor,
  });
}
