// Metro config for `npm run dev`: proxies /api to the Express server so the
// dev client and the server share one origin (cookies and CSRF need that).
const { getDefaultConfig } = require('expo/metro-config');
const http = require('http');

const config = getDefaultConfig(__dirname);
const apiPort = Number(process.env.PORT || 8080);

config.server = config.server || {};
const previous = config.server.enhanceMiddleware;
config.server.enhanceMiddleware = (middleware, server) => {
  const base = previous ? previous(middleware, server) : middleware;
  return (req, res, next) => {
    if (!req.url || !req.url.startsWith('/api')) return base(req, res, next);
    const upstream = http.request(
      { host: '127.0.0.1', port: apiPort, path: req.url, method: req.method, headers: req.headers },
      (answer) => {
        res.writeHead(answer.statusCode || 502, answer.headers);
        answer.pipe(res);
      },
    );
    upstream.on('error', () => {
      res.writeHead(502, { 'content-type': 'application/json' });
      res.end(JSON.stringify({ error: { code: 'api_unreachable', message: `The API server on port ${apiPort} is not answering. Start it with npm start.` } }));
    });
    req.pipe(upstream);
  };
};

// zod re-exports all of its ~40 translations (`z.locales`, about 270 KB of the
// web bundle) although it only ever installs English, which it imports on its
// own. The app never reads `z.locales`, so the web build resolves that list to
// the English module alone: `z.locales.<lang>` is undefined in the browser.
const resolveUpstream = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolve = resolveUpstream ?? context.resolveRequest;
  if (platform === 'web' && moduleName === '../locales/index.js' && /[\\/]node_modules[\\/]zod[\\/]v4[\\/]/.test(context.originModulePath)) {
    return resolve(context, '../locales/en.js', platform);
  }
  return resolve(context, moduleName, platform);
};

// Inline requires: an imported module runs when its export is first used, not
// when its importer loads. The first screen then skips most of expo-router's
// navigators and the modules of screens it never shows (the sign-in page runs
// 1.15 MB of module code instead of 1.47 MB). Warning: a module whose import has
// side effects the importer relies on must be imported bare (`import 'x'`),
// which is never inlined.
const upstreamTransformOptions = config.transformer.getTransformOptions;
config.transformer.getTransformOptions = async (...args) => {
  const base = upstreamTransformOptions ? await upstreamTransformOptions(...args) : {};
  return { ...base, transform: { ...(base.transform ?? {}), inlineRequires: true } };
};

module.exports = config;
