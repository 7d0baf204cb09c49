// Metro for Expo, plus a dev-only proxy: the web dev server passes /api/* to the API so the app stays same-origin
// (the session cookie and the API's Origin check both rely on that). `expo export` ignores the middleware.
const http = require('node:http');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

const API_HOST = '127.0.0.1';
const API_PORT = Number(process.env.SLACKWATER_API_PORT || 8080);

function proxyToApi(req, res) {
  // WARNING: the Host header is passed on unchanged, so the API sees the browser's origin as its own.
  const upstream = http.request(
    { host: API_HOST, port: API_PORT, method: req.method, path: req.url, headers: req.headers },
    (reply) => {
      res.writeHead(reply.statusCode || 502, reply.headers);
      reply.pipe(res);
    },
  );
  upstream.on('error', (error) => {
    if (res.headersSent) return res.destroy(error);
    res.writeHead(502, { 'Content-Type': 'application/json' });
    res.end(JSON.stringify({ error: { code: 'API_UNREACHABLE', message: `No API on ${API_HOST}:${API_PORT}: ${error.message}` } }));
  });
  req.pipe(upstream);
}

config.server = {
  ...config.server,
  enhanceMiddleware: (metroMiddleware) => (req, res, next) => {
    if (req.url === '/api' || (req.url && req.url.startsWith('/api/'))) return proxyToApi(req, res);
    return metroMiddleware(req, res, next);
  },
};

// WARNING: zod re-exports every locale it has (`z.locales`, `z.core.locales`), and Metro keeps every module it is
// given, so all of them would ride in the web app's first load. On the web, zod's own import of its locales index
// gets an English-only stand-in. Anything else asks Metro's usual resolver.
const ZOD_LOCALE_IMPORTERS = /[\\/]node_modules[\\/]zod[\\/]v4[\\/](?:classic|core)[\\/][^\\/]+\.js$/;
const ZOD_LOCALES_STAND_IN = path.join(__dirname, 'metro', 'zod-locales.js');
config.resolver = {
  ...config.resolver,
  resolveRequest: (context, moduleName, platform) => {
    if (platform === 'web' && moduleName === '../locales/index.js' && ZOD_LOCALE_IMPORTERS.test(context.originModulePath)) {
      return { type: 'sourceFile', filePath: ZOD_LOCALES_STAND_IN };
    }
    return context.resolveRequest(context, moduleName, platform);
  },
};

module.exports = config;
