// /api/trees: the trees a case can start from (the authoring routes come with the tree editor).
import { Router } from 'express';
import { actorOf } from '../../middlewares/authenticate';
import { requirePermission } from '../../middlewares/require-permission';
import { listAvailableTrees } from '../../services/trees/list-available-trees';

export function treesRouter() {
  const router = Router();
  router.get('/', requirePermission('trees.read'), async (_req, res) => {
    res.json({ trees: await listAvailableTrees({ actor: actorOf(res) }) });
  });
  return router;
}
