// The matched route's full pattern (`/api/windows/:id`) for a request, never the URL with its values; shared by
// the request metrics and the request log. Express sets req.route when a route matches, but req.baseUrl is put
// back to the outer router's mount path when an error leaves the router, so reading both at the end of a request
// loses the prefix. The pattern is therefore taken at the moment req.route is set. Mount paths here carry no
// parameters, so baseUrl + route.path is the pattern.
import type { Request } from 'express';

const PATTERN = Symbol('routePattern');

type Tracked = Request & { [PATTERN]?: string };

/** Call before routing (a second call is a no-op): from then on the matched pattern is kept for routePattern(). */
export function trackRoutePattern(req: Request): void {
  if (Object.getOwnPropertyDescriptor(req, 'route')?.get) return;
  let route: unknown = req.route;
  Object.defineProperty(req, 'route', {
    configurable: true,
    enumerable: true,
    get: () => route,
    set(value: unknown) {
      route = value;
      const path = (value as { path?: unknown } | undefined)?.path;
      if (typeof path === 'string') (req as Tracked)[PATTERN] = `${req.baseUrl}${path === '/' && req.baseUrl ? '' : path}`;
    },
  });
}

/** The pattern of the last route that matched, or null when none did (or tracking was not started). */
export function routePattern(req: Request): string | null {
  return (req as Tracked)[PATTERN] ?? null;
}
