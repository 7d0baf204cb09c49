// helmet with a Content-Security-Policy that the exported Expo web app runs under.
import type { RequestHandler } from 'express';
import helmet from 'helmet';

export function securityHeaders(): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        'default-src': ["'self'"],
        'script-src': ["'self'"],
        // react-native-web writes its styles at run time (inline <style> and style attributes).
        'style-src': ["'self'", "'unsafe-inline'"],
        'font-src': ["'self'", 'data:'],
        'img-src': ["'self'", 'data:', 'blob:'],
        'connect-src': ["'self'"],
        'object-src': ["'none'"],
        'frame-ancestors': ["'none'"],
        // WARNING: left out on purpose: on a plain-http install (a LAN address) it would rewrite
        // every asset URL to https and the app would not load.
        'upgrade-insecure-requests': null,
      },
    },
  });
}
