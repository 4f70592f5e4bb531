// GET /api/me, PATCH /api/me/preferences.
import { Router } from 'express';
import { updatePreferencesRequestSchema } from '@heatpath/contracts';
import { actorOf, userOf } from '../../middlewares/authenticate';
import { presentMe } from '../../presenters/me.presenter';
import { updatePreferences } from '../../services/preferences/update-preferences';
import { typedRoute } from '../typed-route';

export function meRouter() {
  const router = Router();

  router.get('/', (_req, res) => {
    res.json(presentMe(userOf(res)));
  });

  router.patch(
    '/preferences',
    typedRoute({ body: updatePreferencesRequestSchema }, async ({ body }, res) => {
      const updated = await updatePreferences({ actor: actorOf(res), input: body });
      updated.workshop = userOf(res).workshop;
      res.json(presentMe(updated));
    }),
  );

  return router;
}
