// Cross-site request refusal for state-changing methods (Origin / Sec-Fetch-Site), with SameSite=Lax as the second layer.
import type { Request, RequestHandler } from 'express';
import { BadOriginError } from '../errors';

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
/** `none` = the user typed the URL or used a bookmark; never a page of another site. */
const ALLOWED_FETCH_SITES = new Set(['same-origin', 'none']);

function originHost(origin: string): string | null {
  try {
    return new URL(origin).host;
  } catch {
    return null; // includes the opaque origin "null"
  }
}

function isAllowed(req: Request, allowedOrigins: string[]): boolean {
  const origin = req.get('origin');
  if (origin) {
    // Host comparison rather than full origin, so a TLS-terminating proxy in front does not break it.
    return allowedOrigins.includes(origin) || originHost(origin) === req.get('host');
  }
  const fetchSite = req.get('sec-fetch-site');
  // Neither header: not a browser (curl, scripts, tests), which cookies alone cannot be forged from.
  return !fetchSite || ALLOWED_FETCH_SITES.has(fetchSite);
}

export function originCheck({ allowedOrigins }: { allowedOrigins: string[] }): RequestHandler {
  return (req, _res, next) => {
    if (!STATE_CHANGING.has(req.method) || isAllowed(req, allowedOrigins)) return next();
    next(new BadOriginError());
  };
}
