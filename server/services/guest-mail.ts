import type { MailMessage } from '../mail/mailer';
import { renderMail } from '../mail/templates';

/** The safety note every guest link carries, in the mail and on the first page. */
export const GUEST_SAFETY_NOTE =
  'Safety first: engine work can hurt. Work with the engine off and cool unless a step says otherwise, keep hands and clothes clear of belts and fans, and never run an engine in a closed space. Where a step says to stop, stop and call the shop or a professional. Local rules apply.';

const formatDate = (d: Date) => d.toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

/** The guest link mail: who sends which check, the safety note, the link, how long it works and how to reach the shop. */
export function guestLinkMail(input: {
  to: string;
  shopName: string;
  customerName: string;
  senderName: string;
  treeTitle: string;
  url: string;
  expiresAt: Date;
  contact: { phone: string | null; email: string | null };
}): MailMessage {
  const reach = [input.contact.phone ? `call ${input.contact.phone}` : null, input.contact.email ? `write to ${input.contact.email}` : null].filter(Boolean).join(' or ');
  return renderMail({
    to: input.to,
    subject: `${input.shopName}: a step-by-step check for your car`,
    shopName: input.shopName,
    heading: input.treeTitle,
    paragraphs: [
      `Hello ${input.customerName},`,
      `${input.senderName} at ${input.shopName} sent you a guided check to work through at your own pace. Each step says what to look at or measure; your answers, readings and photos go straight to the shop.`,
      GUEST_SAFETY_NOTE,
    ],
    action: { label: 'Open the guided check', url: input.url },
    after: [
      `The link works until ${formatDate(input.expiresAt)}. Keep it to yourself: anyone with it can add to your check.`,
      reach ? `Questions? ${reach[0].toUpperCase()}${reach.slice(1)}.` : `Questions? Contact ${input.shopName}.`,
    ],
  });
}
