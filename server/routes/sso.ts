// GET /api/sso and PUT /api/sso (admin): the single sign-on issuer settings. The client secret is written, never read.
import express, { type Router } from 'express';
import { ADMIN_ROLES } from '../../shared/permissions';
import { ssoSettingsSchema, ssoSettingsUpdateSchema } from '../../shared/sso';
import { currentUser, staffOnlyRoute } from '../auth/guards';
import { getSsoSettings, saveSsoSettings, ssoRedirectUri, toPublicSettings } from '../auth/sso/settings';
import type { RouteDeps } from './deps';

export function ssoSettingsRouter({ db, config, now }: RouteDeps): Router {
  const router = express.Router();
  const redirectUri = ssoRedirectUri(config.publicUrl);

  router.get('/', ...staffOnlyRoute(...ADMIN_ROLES), async (_req, res) => {
    res.json(ssoSettingsSchema.parse(toPublicSettings(await getSsoSettings(db), redirectUri)));
  });

  router.put('/', ...staffOnlyRoute(...ADMIN_ROLES), async (req, res) => {
    const input = ssoSettingsUpdateSchema.parse(req.body);
    const saved = await saveSsoSettings(db, { input, actorId: currentUser(req).id, now: now(), redirectUri });
    res.json(ssoSettingsSchema.parse(saved));
  });

  return router;
}
