// Loads one tree (and optionally one of its versions) of the caller's workshop, or 404.
import type { Transaction } from 'sequelize';
import { Tree, TreeVersion } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';

export async function findTree(options: {
  actor: Actor;
  treeId: string;
  transaction?: Transaction;
  lock?: boolean;
}) {
  const tree = await Tree.findOne({
    where: { id: options.treeId, workshopId: options.actor.workshopId },
    transaction: options.transaction,
    lock: options.lock ? options.transaction?.LOCK.UPDATE : undefined,
  });
  if (!tree) throw notFound('That tree');
  return tree;
}

export async function findTreeVersion(options: {
  actor: Actor;
  treeId: string;
  versionId: string;
  transaction?: Transaction;
  lock?: boolean;
}) {
  const version = await TreeVersion.findOne({
    where: { id: options.versionId, treeId: options.treeId, workshopId: options.actor.workshopId },
    transaction: options.transaction,
    lock: options.lock ? options.transaction?.LOCK.UPDATE : undefined,
  });
  if (!version) throw notFound('That tree version');
  return version;
}

export async function findDraft(options: {
  actor: Actor;
  treeId: string;
  transaction?: Transaction;
  lock?: boolean;
}) {
  const draft = await TreeVersion.findOne({
    where: { treeId: options.treeId, workshopId: options.actor.workshopId, status: 'draft' },
    transaction: options.transaction,
    lock: options.lock ? options.transaction?.LOCK.UPDATE : undefined,
  });
  if (!draft) throw notFound('A draft of that tree');
  return draft;
}
