// /api/trees: the library, versions, drafts, publish and retire, diff, export, regression replay,
// and deleting a tree that was never published.
import { Router } from 'express';
import type { Response } from 'express';
import type { CreateTreeRequest, PublishDraftRequest, SaveDraftRequest } from '@heatpath/contracts';
import { compileTree, diffTrees } from '@heatpath/fault-tree';
import { User } from '../../db/models/index';
import type { TreeVersion } from '../../db/models/index';
import { AppError } from '../../errors';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { validate } from '../../middlewares/validate';
import { presentVersionDetail } from '../../presenters/tree.presenter';
import { createTree } from '../../services/trees/create-tree';
import { deleteUnpublishedTree } from '../../services/trees/delete-tree';
import {
  discardDraft,
  retireVersion,
  saveDraft,
  startDraft,
} from '../../services/trees/draft-lifecycle';
import { findDraft, findTree, findTreeVersion } from '../../services/trees/find-tree';
import { caseCountsByVersion, listTreeLibrary } from '../../services/trees/list-tree-library';
import { listAvailableTrees } from '../../services/trees/list-available-trees';
import { publishDraft } from '../../services/trees/publish-draft';
import { replayRegression } from '../../services/trees/replay-regression';
import { setRegressionSet } from '../../services/trees/set-regression-set';
import { RegressionCase } from '../../db/models/index';
import {
  createTreeRequestSchema,
  diffQuerySchema,
  publishDraftRequestSchema,
  regressionSetRequestSchema,
  saveDraftRequestSchema,
  startDraftRequestSchema,
  treeParamsSchema,
  versionParamsSchema,
} from './trees.schema';

const params = (res: Response) => res.locals.params as { treeId: string; versionId?: string };

async function versionDetail(res: Response, version: TreeVersion) {
  const counts = await caseCountsByVersion(actorOf(res).workshopId, [version.treeId]);
  const publisher = version.publishedBy ? await User.findByPk(version.publishedBy) : null;
  return presentVersionDetail(version, { caseCount: counts.get(version.id) ?? 0, publisher });
}

export function treesRouter() {
  const router = Router();

  // Every role that opens cases needs the list of trees to start from.
  router.get('/available', requirePermission('trees.read'), async (_req, res) => {
    res.json({ trees: await listAvailableTrees({ actor: actorOf(res) }) });
  });

  router.get('/', requirePermission('trees.read'), async (_req, res) => {
    res.json({ trees: await listTreeLibrary({ actor: actorOf(res) }) });
  });

  router.post(
    '/',
    requirePermission('trees.edit'),
    validate('body', createTreeRequestSchema),
    async (_req, res) => {
      const { tree, draft } = await createTree({
        actor: actorOf(res),
        input: res.locals.body as CreateTreeRequest,
      });
      res.status(201).json({ treeId: tree.id, draft: await versionDetail(res, draft) });
    },
  );

  router.use('/:treeId', validate('params', treeParamsSchema));

  router.get('/:treeId', requirePermission('trees.read'), async (_req, res) => {
    const [entry] = await listTreeLibrary({ actor: actorOf(res), treeId: params(res).treeId });
    if (!entry) throw new AppError('not_found', 'That tree was not found.');
    const regression = await RegressionCase.findAll({
      where: { treeId: entry.id, workshopId: actorOf(res).workshopId },
    });
    res.json({ ...entry, regressionCaseIds: regression.map((r) => r.caseId) });
  });

  router.delete('/:treeId', requirePermission('trees.delete'), async (_req, res) => {
    await deleteUnpublishedTree({ actor: actorOf(res), treeId: params(res).treeId });
    res.status(204).end();
  });

  router.get(
    '/:treeId/versions/:versionId',
    requirePermission('trees.read'),
    validate('params', versionParamsSchema),
    async (_req, res) => {
      const { treeId, versionId } = params(res) as { treeId: string; versionId: string };
      const version = await findTreeVersion({ actor: actorOf(res), treeId, versionId });
      if (version.status === 'draft' && actorOf(res).role !== 'lead')
        throw new AppError('not_found', 'That tree version was not found.');
      res.json(await versionDetail(res, version));
    },
  );

  router.get(
    '/:treeId/versions/:versionId/export',
    requirePermission('trees.read'),
    validate('params', versionParamsSchema),
    async (_req, res) => {
      const { treeId, versionId } = params(res) as { treeId: string; versionId: string };
      const actor = actorOf(res);
      const tree = await findTree({ actor, treeId });
      const version = await findTreeVersion({ actor, treeId, versionId });
      if (version.status === 'draft' && actor.role !== 'lead')
        throw new AppError('not_found', 'That tree version was not found.');
      res.set(
        'Content-Disposition',
        `attachment; filename="${tree.key}-v${version.version}.heatpath-tree.json"`,
      );
      res.type('application/json').send(JSON.stringify(version.definition, null, 2));
    },
  );

  router.post(
    '/:treeId/versions/:versionId/retire',
    requirePermission('trees.edit'),
    validate('params', versionParamsSchema),
    async (_req, res) => {
      const { treeId, versionId } = params(res) as { treeId: string; versionId: string };
      res.json(
        await versionDetail(res, await retireVersion({ actor: actorOf(res), treeId, versionId })),
      );
    },
  );

  router.get(
    '/:treeId/diff',
    requirePermission('trees.read'),
    validate('query', diffQuerySchema),
    async (_req, res) => {
      const actor = actorOf(res);
      const { treeId } = params(res);
      const { from, to } = res.locals.query as { from: string; to: string };
      const [a, b] = await Promise.all([
        findTreeVersion({ actor, treeId, versionId: from }),
        findTreeVersion({ actor, treeId, versionId: to }),
      ]);
      res.json({
        from: { id: a.id, version: a.version, status: a.status },
        to: { id: b.id, version: b.version, status: b.status },
        diff: diffTrees(a.definition, b.definition),
      });
    },
  );

  router.post(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    validate('body', startDraftRequestSchema),
    async (_req, res) => {
      const { fromVersionId } = res.locals.body as { fromVersionId?: string };
      const draft = await startDraft({
        actor: actorOf(res),
        treeId: params(res).treeId,
        ...(fromVersionId ? { fromVersionId } : {}),
      });
      res.status(201).json(await versionDetail(res, draft));
    },
  );

  router.get('/:treeId/draft', requirePermission('trees.edit'), async (_req, res) => {
    res.json(
      await versionDetail(
        res,
        await findDraft({ actor: actorOf(res), treeId: params(res).treeId }),
      ),
    );
  });

  router.put(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    validate('body', saveDraftRequestSchema),
    async (_req, res) => {
      const draft = await saveDraft({
        actor: actorOf(res),
        treeId: params(res).treeId,
        input: res.locals.body as SaveDraftRequest,
      });
      res.json(await versionDetail(res, draft));
    },
  );

  router.delete('/:treeId/draft', requirePermission('trees.edit'), async (_req, res) => {
    await discardDraft({ actor: actorOf(res), treeId: params(res).treeId });
    res.status(204).end();
  });

  router.post('/:treeId/draft/regression', requirePermission('trees.edit'), async (_req, res) => {
    const actor = actorOf(res);
    const { treeId } = params(res);
    const draft = await findDraft({ actor, treeId });
    const compiled = compileTree(draft.definition);
    if (!compiled.ok)
      throw new AppError(
        'conflict',
        `Fix the draft's ${compiled.problems.length} problem(s) before replaying cases against it.`,
      );
    res.json(await replayRegression({ actor, treeId, draft, compiled: compiled.tree }));
  });

  router.post(
    '/:treeId/draft/publish',
    requirePermission('trees.edit'),
    validate('body', publishDraftRequestSchema),
    async (_req, res) => {
      const published = await publishDraft({
        actor: actorOf(res),
        treeId: params(res).treeId,
        input: res.locals.body as PublishDraftRequest,
      });
      res.json(await versionDetail(res, published));
    },
  );

  router.put(
    '/:treeId/regression-set',
    requirePermission('trees.edit'),
    validate('body', regressionSetRequestSchema),
    async (_req, res) => {
      const caseIds = await setRegressionSet({
        actor: actorOf(res),
        treeId: params(res).treeId,
        caseIds: (res.locals.body as { caseIds: string[] }).caseIds,
      });
      res.json({ caseIds });
    },
  );

  return router;
}
