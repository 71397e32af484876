import { ROLE_LABELS, type Role } from '@/shared/roles';
import type { MailMessage } from './mailer';

/** Escapes text for HTML element content and double-quoted attributes. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

interface Layout {
  to: string;
  subject: string;
  shopName: string;
  heading: string;
  paragraphs: string[];
  action: { label: string; url: string };
  after: string[];
}

/**
 * Every Baywalk mail: the shop's name, a heading, some plain paragraphs, one
 * link as a button, and notes after it. All values are escaped for the HTML
 * part; the text part carries the same words and the bare link.
 */
export function renderMail(m: Layout): MailMessage {
  const text = [m.shopName, '', m.heading, '', ...m.paragraphs.flatMap((p) => [p, '']), `${m.action.label}:`, m.action.url, '', ...m.after.flatMap((p) => [p, '']), '— Baywalk']
    .join('\n')
    .trimEnd();
  const p = (s: string) => `<p style="margin:0 0 16px;font-size:16px;line-height:24px;color:#1E2A32">${escapeHtml(s)}</p>`;
  const small = (s: string) => `<p style="margin:0 0 12px;font-size:14px;line-height:20px;color:#4E5D68">${escapeHtml(s)}</p>`;
  const url = escapeHtml(m.action.url);
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(m.subject)}</title></head>
<body style="margin:0;padding:24px;background:#F6F4EF;font-family:'Nunito Sans',Arial,sans-serif">
<div style="max-width:560px;margin:0 auto;background:#FFFFFF;border:1px solid #D8D2C4;border-radius:12px;padding:28px">
<p style="margin:0 0 4px;font-size:14px;font-weight:700;color:#0A5E58">${escapeHtml(m.shopName)}</p>
<h1 style="margin:0 0 20px;font-size:22px;line-height:28px;color:#1E2A32">${escapeHtml(m.heading)}</h1>
${m.paragraphs.map(p).join('\n')}
<p style="margin:24px 0"><a href="${url}" style="display:inline-block;background:#0E7C74;color:#FFFFFF;font-weight:700;font-size:16px;text-decoration:none;padding:14px 22px;border-radius:10px">${escapeHtml(m.action.label)}</a></p>
${small('If the button does not work, copy this address into your browser:')}
<p style="margin:0 0 20px;font-size:14px;word-break:break-all"><a href="${url}" style="color:#0A5E58">${url}</a></p>
${m.after.map(small).join('\n')}
<p style="margin:16px 0 0;font-size:14px;color:#4E5D68">— Baywalk</p>
</div></body></html>`;
  return { to: m.to, subject: m.subject, text, html };
}

/** The invitation mail: who invited whom, to which shop and role, and the single-use link. */
export function invitationMail(input: { to: string; shopName: string; invitedBy: string; role: Role; url: string; expiresAt: Date }): MailMessage {
  return renderMail({
    to: input.to,
    subject: `You are invited to ${input.shopName} on Baywalk`,
    shopName: input.shopName,
    heading: `Join ${input.shopName} on Baywalk`,
    paragraphs: [
      `${input.invitedBy} invited you to join ${input.shopName} as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      'Baywalk guides fault-finding after engine installs, step by step, with readings and photos.',
      'Open the link to choose your name and password.',
    ],
    action: { label: 'Accept the invitation', url: input.url },
    after: [
      `The link works once and until ${formatDate(input.expiresAt)}.`,
      'If you did not expect this invitation, ignore this mail; nothing happens without the link.',
    ],
  });
}

/** The password reset mail: a single-use link valid for one hour. */
export function passwordResetMail(input: { to: string; shopName: string; name: string; url: string }): MailMessage {
  return renderMail({
    to: input.to,
    subject: 'Choose a new Baywalk password',
    shopName: input.shopName,
    heading: 'Choose a new password',
    paragraphs: [`Hello ${input.name},`, 'Someone (hopefully you) asked to reset the password of your Baywalk account. Open the link to choose a new one.'],
    action: { label: 'Choose a new password', url: input.url },
    after: ['The link works once, for one hour.', 'If you did not ask for this, ignore this mail: your password stays as it is.'],
  });
}

function formatDate(d: Date): string {
  return d.toLocaleString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', hour: '2-digit', minute: '2-digit', timeZone: 'UTC', timeZoneName: 'short' });
}
