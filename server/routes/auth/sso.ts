// Single sign-on through the configured OpenID Connect issuer, no session needed:
// GET /api/auth/sso/button (may the sign-in screen offer it, and in what words),
// GET /api/auth/sso/start (302 to the issuer), GET /api/auth/sso/callback (302 into the app, or back to sign-in
// with ?sso_error=<reason>).
import express, { type Response, type Router } from 'express';
import { z } from 'zod';
import { ssoButtonSchema, type SsoErrorCode } from '../../../shared/sso';
import { discoverIssuer } from '../../auth/sso/discovery';
import { SsoSignInError } from '../../auth/sso/errors';
import { startSignIn } from '../../auth/sso/flow';
import { clearPendingCookie, readPendingCookie, setPendingCookie } from '../../auth/sso/pending-cookie';
import { getSsoSettings, ssoRedirectUri } from '../../auth/sso/settings';
import { completeSsoSignIn } from '../../auth/sso/sign-in';
import { setSessionCookie } from '../../auth/session-cookie';
import { displayAddress, userAgentLabel } from '../../auth/user-agent-label';
import type { RouteDeps } from '../deps';

const callbackQuerySchema = z.object({
  code: z.string().max(4096).optional(), state: z.string().max(512).optional(), error: z.string().max(200).optional(),
});

const backToSignIn = (res: Response, reason: SsoErrorCode) => res.redirect(302, `/sign-in?sso_error=${reason}`);

export function ssoSignInRouter({ db, config, now }: RouteDeps): Router {
  const router = express.Router();
  const redirectUri = ssoRedirectUri(config.publicUrl);

  router.get('/button', async (_req, res) => {
    const settings = await getSsoSettings(db);
    const enabled = settings?.enabled === true;
    res.json(ssoButtonSchema.parse({ enabled, displayName: enabled ? settings.displayName : null }));
  });

  router.get('/start', async (req, res) => {
    const settings = await getSsoSettings(db);
    if (!settings?.enabled) return backToSignIn(res, 'off');
    try {
      const { url, pending } = startSignIn(settings, await discoverIssuer(settings.issuerUrl), redirectUri);
      setPendingCookie(req, res, pending, config.cookieSecure);
      res.redirect(302, url.toString());
    } catch (err) {
      if (err instanceof SsoSignInError) return backToSignIn(res, err.reason);
      throw err;
    }
  });

  router.get('/callback', async (req, res) => {
    const settings = await getSsoSettings(db);
    const pending = readPendingCookie(req);
    // One try per start: a replayed or reloaded callback finds no pending sign-in.
    clearPendingCookie(req, res, config.cookieSecure);
    if (!settings?.enabled) return backToSignIn(res, 'off');
    const query = callbackQuerySchema.safeParse(req.query);
    try {
      const { token } = await completeSsoSignIn(db, {
        settings, pending, query: query.success ? query.data : {}, redirectUri, now: now(),
        userAgent: userAgentLabel(req.get('user-agent')), address: displayAddress(req.ip),
      });
      const maxAgeSeconds = Math.min(config.sessionInactivitySeconds, config.sessionMaxAgeSeconds);
      setSessionCookie(req, res, { token, maxAgeSeconds, secureMode: config.cookieSecure });
      res.redirect(302, '/');
    } catch (err) {
      if (err instanceof SsoSignInError) return backToSignIn(res, err.reason);
      throw err;
    }
  });

  return router;
}
