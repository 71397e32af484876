/// <reference types="node" />
// The yardstick for `npm run bench:load`: a bare Express 5 app with one GET
// and one JSON POST route, nothing else (no session, no database), run as
// its own process like the real server so both get the same share of the CPU.
import express from 'express';

const app = express();
app.disable('x-powered-by');
app.use(express.json({ limit: '256kb' }));
app.get('/bare', (_req, res) => {
  res.json({ ok: true });
});
app.post('/bare', (req, res) => {
  res.json({ ok: true, got: req.body });
});
const server = app.listen(Number(process.env.PORT ?? 0), '127.0.0.1', () => {
  const address = server.address();
  console.log(`bare express listening on ${typeof address === 'object' && address ? address.port : address}`);
});
process.on('SIGTERM', () => server.close(() => process.exit(0)));
