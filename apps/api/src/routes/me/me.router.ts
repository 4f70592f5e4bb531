// GET /api/me, PATCH /api/me/preferences.
import { Router } from 'express';
import { updatePreferencesRequestSchema } from '@heatpath/contracts';
import type { UpdatePreferencesRequest } from '@heatpath/contracts';
import { actorOf, userOf } from '../../middlewares/authenticate';
import { validate } from '../../middlewares/validate';
import { presentMe } from '../../presenters/me.presenter';
import { updatePreferences } from '../../services/preferences/update-preferences';

export function meRouter() {
  const router = Router();

  router.get('/', (_req, res) => {
    res.json(presentMe(userOf(res)));
  });

  router.patch(
    '/preferences',
    validate('body', updatePreferencesRequestSchema),
    async (_req, res) => {
      const updated = await updatePreferences({
        actor: actorOf(res),
        input: res.locals.body as UpdatePreferencesRequest,
      });
      updated.workshop = userOf(res).workshop;
      res.json(presentMe(updated));
    },
  );

  return router;
}
