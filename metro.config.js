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

module.exports = config;
