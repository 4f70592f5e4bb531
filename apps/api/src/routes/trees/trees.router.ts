// /api/trees: the library, versions, drafts, publish and retire, diff, export, regression replay,
// and deleting a tree that was never published.
import { Router } from 'express';
import type { Response } from 'express';
import { compileTree, diffTrees } from '@heatpath/fault-tree';
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
import { getTree } from '../../services/trees/get-tree';
import { getVersionUsage } from '../../services/trees/get-version-usage';
import { listTreeLibrary } from '../../services/trees/list-tree-library';
import { listAvailableTrees } from '../../services/trees/list-available-trees';
import { publishDraft } from '../../services/trees/publish-draft';
import { replayRegression } from '../../services/trees/replay-regression';
import { setRegressionSet } from '../../services/trees/set-regression-set';
import { typedRoute } from '../typed-route';
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

async function versionDetail(res: Response, version: TreeVersion) {
  return presentVersionDetail(version, await getVersionUsage({ actor: actorOf(res), version }));
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
    typedRoute({ body: createTreeRequestSchema }, async ({ body }, res) => {
      const { tree, draft } = await createTree({ actor: actorOf(res), input: body });
      res.status(201).json({ treeId: tree.id, draft: await versionDetail(res, draft) });
    }),
  );

  router.use('/:treeId', validate('params', treeParamsSchema));
  const tree = { params: treeParamsSchema };
  const version = { params: versionParamsSchema };

  router.get(
    '/:treeId',
    requirePermission('trees.read'),
    typedRoute(tree, async ({ params: { treeId } }, res) => {
      res.json(await getTree({ actor: actorOf(res), treeId }));
    }),
  );

  router.delete(
    '/:treeId',
    requirePermission('trees.delete'),
    typedRoute(tree, async ({ params: { treeId } }, res) => {
      await deleteUnpublishedTree({ actor: actorOf(res), treeId });
      res.status(204).end();
    }),
  );

  router.get(
    '/:treeId/versions/:versionId',
    requirePermission('trees.read'),
    typedRoute(version, async ({ params: { treeId, versionId } }, res) => {
      const found = await findTreeVersion({ actor: actorOf(res), treeId, versionId });
      if (found.status === 'draft' && actorOf(res).role !== 'lead')
        throw new AppError('not_found', 'That tree version was not found.');
      res.json(await versionDetail(res, found));
    }),
  );

  router.get(
    '/:treeId/versions/:versionId/export',
    requirePermission('trees.read'),
    typedRoute(version, async ({ params: { treeId, versionId } }, res) => {
      const actor = actorOf(res);
      const found = await findTree({ actor, treeId });
      const exported = await findTreeVersion({ actor, treeId, versionId });
      if (exported.status === 'draft' && actor.role !== 'lead')
        throw new AppError('not_found', 'That tree version was not found.');
      res.set(
        'Content-Disposition',
        `attachment; filename="${found.key}-v${exported.version}.heatpath-tree.json"`,
      );
      res.type('application/json').send(JSON.stringify(exported.definition, null, 2));
    }),
  );

  router.post(
    '/:treeId/versions/:versionId/retire',
    requirePermission('trees.edit'),
    typedRoute(version, async ({ params: { treeId, versionId } }, res) => {
      res.json(
        await versionDetail(res, await retireVersion({ actor: actorOf(res), treeId, versionId })),
      );
    }),
  );

  router.get(
    '/:treeId/diff',
    requirePermission('trees.read'),
    typedRoute(
      { params: treeParamsSchema, query: diffQuerySchema },
      async ({ params: { treeId }, query: { from, to } }, res) => {
        const actor = actorOf(res);
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
    ),
  );

  router.post(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    typedRoute(
      { params: treeParamsSchema, body: startDraftRequestSchema },
      async ({ params: { treeId }, body: { fromVersionId } }, res) => {
        const draft = await startDraft({
          actor: actorOf(res),
          treeId,
          ...(fromVersionId ? { fromVersionId } : {}),
        });
        res.status(201).json(await versionDetail(res, draft));
      },
    ),
  );

  router.get(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    typedRoute(tree, async ({ params: { treeId } }, res) => {
      res.json(await versionDetail(res, await findDraft({ actor: actorOf(res), treeId })));
    }),
  );

  router.put(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    typedRoute(
      { params: treeParamsSchema, body: saveDraftRequestSchema },
      async ({ params: { treeId }, body }, res) => {
        const draft = await saveDraft({ actor: actorOf(res), treeId, input: body });
        res.json(await versionDetail(res, draft));
      },
    ),
  );

  router.delete(
    '/:treeId/draft',
    requirePermission('trees.edit'),
    typedRoute(tree, async ({ params: { treeId } }, res) => {
      await discardDraft({ actor: actorOf(res), treeId });
      res.status(204).end();
    }),
  );

  router.post(
    '/:treeId/draft/regression',
    requirePermission('trees.edit'),
    typedRoute(tree, async ({ params: { treeId } }, res) => {
      const actor = actorOf(res);
      const draft = await findDraft({ actor, treeId });
      const compiled = compileTree(draft.definition);
      if (!compiled.ok)
        throw new AppError(
          'conflict',
          `Fix the draft's ${compiled.problems.length} problem(s) before replaying cases against it.`,
        );
      res.json(await replayRegression({ actor, treeId, draft, compiled: compiled.tree }));
    }),
  );

  router.post(
    '/:treeId/draft/publish',
    requirePermission('trees.edit'),
    typedRoute(
      { params: treeParamsSchema, body: publishDraftRequestSchema },
      async ({ params: { treeId }, body }, res) => {
        const published = await publishDraft({ actor: actorOf(res), treeId, input: body });
        res.json(await versionDetail(res, published));
      },
    ),
  );

  router.put(
    '/:treeId/regression-set',
    requirePermission('trees.edit'),
    typedRoute(
      { params: treeParamsSchema, body: regressionSetRequestSchema },
      async ({ params: { treeId }, body }, res) => {
        const caseIds = await setRegressionSet({
          actor: actorOf(res),
          treeId,
          caseIds: body.caseIds,
        });
        res.json({ caseIds });
      },
    ),
  );

  return router;
}
