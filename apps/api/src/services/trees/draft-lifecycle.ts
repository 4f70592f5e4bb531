// A tree's draft: start one from a version, save it with optimistic concurrency (a stale save is
// refused with 409, never silently overwritten), or discard it. Drafts may hold problems.
import type { SaveDraftRequest } from '@heatpath/contracts';
import { Tree, TreeVersion } from '../../db/models/index';
import { AppError, conflict } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { findDraft, findTree, findTreeVersion } from './find-tree';
import { withTransaction } from '../../db/with-transaction';

export async function startDraft(options: {
  actor: Actor;
  treeId: string;
  fromVersionId?: string;
}) {
  const { actor, treeId } = options;
  assertCan(actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    const tree = await findTree({ actor, treeId, transaction, lock: true });
    const existing = await TreeVersion.findOne({
      where: { treeId: tree.id, status: 'draft' },
      transaction,
    });
    if (existing)
      throw conflict(
        `There is already a draft of “${tree.title}”; open it instead of starting another.`,
      );
    const source = options.fromVersionId
      ? await findTreeVersion({ actor, treeId, versionId: options.fromVersionId, transaction })
      : await TreeVersion.findOne({
          where: { treeId: tree.id },
          order: [['version', 'DESC']],
          transaction,
        });
    if (!source) throw new AppError('conflict', 'That tree has no version to start a draft from.');
    const last = (await TreeVersion.max('version', {
      where: { treeId: tree.id },
      transaction,
    })) as number;
    return TreeVersion.create(
      {
        treeId: tree.id,
        workshopId: actor.workshopId,
        version: last + 1,
        status: 'draft',
        definition: structuredClone(source.definition),
        basedOnVersion: source.version,
        createdBy: actor.userId,
        publishedBy: null,
        publishedAt: null,
        changeNote: null,
      },
      { transaction },
    );
  });
}

export async function saveDraft(options: {
  actor: Actor;
  treeId: string;
  input: SaveDraftRequest;
}) {
  const { actor, treeId, input } = options;
  assertCan(actor, 'trees.edit');
  if (
    input.definition === null ||
    typeof input.definition !== 'object' ||
    Array.isArray(input.definition)
  ) {
    throw new AppError('validation_failed', 'The draft must be a tree definition object.');
  }
  return withTransaction(async (transaction) => {
    const draft = await findDraft({ actor, treeId, transaction, lock: true });
    if (draft.revision !== input.revision) {
      throw conflict(
        `Someone else saved this draft after you opened it (now revision ${draft.revision}). Reload it, or compare your changes first.`,
      );
    }
    const d = input.definition as Record<string, unknown>;
    const tree = await Tree.findByPk(treeId, { transaction });
    // The tree's identity stays: a draft may rename its title, never its key.
    const definition = { ...d, id: tree?.key ?? d.id };
    await draft.update({ definition, revision: draft.revision + 1 }, { transaction });
    if (
      tree &&
      typeof d.title === 'string' &&
      typeof d.symptom === 'string' &&
      d.title.trim() &&
      d.symptom.trim()
    ) {
      await tree.update(
        { title: d.title.slice(0, 200), symptom: d.symptom.slice(0, 300) },
        { transaction },
      );
    }
    return draft;
  });
}

export async function discardDraft(options: { actor: Actor; treeId: string }) {
  assertCan(options.actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    const draft = await findDraft({ ...options, transaction, lock: true });
    const versions = await TreeVersion.count({ where: { treeId: options.treeId }, transaction });
    if (versions === 1)
      throw new AppError(
        'conflict',
        'This draft is the tree’s only version; it cannot be discarded.',
      );
    await draft.destroy({ transaction });
  });
}

/**
 * Retires a published version. The version row is locked first, so of several concurrent
 * retires exactly one finds it published; the others see it retired and get 409.
 */
export async function retireVersion(options: { actor: Actor; treeId: string; versionId: string }) {
  assertCan(options.actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    const version = await findTreeVersion({ ...options, transaction, lock: true });
    if (version.status === 'retired')
      throw conflict(`Version ${version.version} is already retired; nothing was changed.`);
    if (version.status !== 'published')
      throw new AppError(
        'conflict',
        `Only a published version can be retired; this one is ${version.status}.`,
      );
    return version.update({ status: 'retired', retiredAt: new Date() }, { transaction });
  });
}
