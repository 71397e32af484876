import express, { type Express } from 'express';
import { escapeHtml } from '../mail/templates';
import { caughtMailIds, readCaughtMail } from '../mail/caught-mail';

const PAGE_SIZE = 50;

/**
 * Development-only pages listing the mail the local catcher caught:
 * /dev/mail (newest first), /dev/mail/:id (one message), /dev/mail/:id/html
 * (its HTML part, sandboxed). app.ts mounts them only outside production.
 */
export function mountDevMail(app: Express, mailDir: string) {
  const router = express.Router();

  router.get('/', async (_req, res) => {
    const ids = caughtMailIds(mailDir).slice(0, PAGE_SIZE);
    const mails = (await Promise.all(ids.map((id) => readCaughtMail(mailDir, id)))).filter((m) => m !== undefined);
    const rows = mails
      .map(
        (m) =>
          `<tr><td>${escapeHtml(m.receivedAt.toISOString().replace('T', ' ').slice(0, 19))}</td><td>${escapeHtml(m.to)}</td><td><a href="/dev/mail/${m.id}">${escapeHtml(m.subject)}</a></td></tr>`,
      )
      .join('\n');
    res.type('html').send(
      page(
        'Caught mail',
        `<p>Mail sent by this development server goes to the local catcher and is kept in <code>${escapeHtml(mailDir)}</code>. Nothing leaves this machine.</p>
${mails.length ? `<table><thead><tr><th>Received (UTC)</th><th>To</th><th>Subject</th></tr></thead><tbody>${rows}</tbody></table>` : '<p><strong>No mail caught yet.</strong> Invite someone or ask for a password reset, then reload.</p>'}`,
      ),
    );
  });

  router.get('/:id', async (req, res) => {
    const m = await readCaughtMail(mailDir, req.params.id);
    if (!m) {
      res.status(404).type('html').send(page('Not found', '<p>There is no caught mail with that id. <a href="/dev/mail">Back to the list</a></p>'));
      return;
    }
    res.type('html').send(
      page(
        m.subject,
        `<p><a href="/dev/mail">← All caught mail</a></p>
<dl><dt>From</dt><dd>${escapeHtml(m.from)}</dd><dt>To</dt><dd>${escapeHtml(m.to)}</dd><dt>Received (UTC)</dt><dd>${escapeHtml(m.receivedAt.toISOString())}</dd></dl>
<h2>Text part</h2><pre>${escapeHtml(m.text)}</pre>
${m.html ? `<h2>HTML part</h2><iframe title="HTML part" src="/dev/mail/${m.id}/html" sandbox></iframe>` : '<p>No HTML part.</p>'}`,
      ),
    );
  });

  router.get('/:id/html', async (req, res) => {
    const m = await readCaughtMail(mailDir, req.params.id);
    if (!m?.html) {
      res.status(404).type('text/plain').send('No HTML part.');
      return;
    }
    // The mail's own HTML, shown without scripts, forms or outside requests.
    res.setHeader('Content-Security-Policy', "sandbox; default-src 'none'; style-src 'unsafe-inline'; img-src data:");
    res.type('html').send(m.html);
  });

  app.use('/dev/mail', router);
}

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1"><title>${escapeHtml(title)} · Baywalk development</title>
<style>body{font-family:system-ui,sans-serif;background:#F6F4EF;color:#1E2A32;margin:0;padding:24px}main{max-width:960px;margin:0 auto}
table{border-collapse:collapse;width:100%;background:#fff}th,td{border-bottom:1px solid #D8D2C4;padding:10px;text-align:left;vertical-align:top}
a{color:#0A5E58}pre{white-space:pre-wrap;background:#fff;border:1px solid #D8D2C4;padding:12px}iframe{width:100%;height:640px;border:1px solid #D8D2C4;background:#fff}
dt{font-weight:700}dd{margin:0 0 8px}.dev{background:#FDF1E4;border-left:6px solid #B45309;padding:8px 12px}</style></head>
<body><main><p class="dev">⚠ Development page: not available in production.</p><h1>${escapeHtml(title)}</h1>${body}</main></body></html>`;
}
