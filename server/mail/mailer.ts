import nodemailer from 'nodemailer';
import type { Config } from '../config';

/** One message with both a plain-text and an HTML part. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** What features use to send mail (invitations, password resets, guest links). */
export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/**
 * Sends over SMTP with nodemailer. In development and tests the host is the
 * local catcher on loopback (no TLS there); in production the BAYWALK_SMTP_*
 * settings name the real server.
 */
export function createSmtpMailer(smtp: Config['smtp']): Mailer {
  const loopback = smtp.host === '127.0.0.1' || smtp.host === 'localhost' || smtp.host === '::1';
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    auth: smtp.user ? { user: smtp.user, pass: smtp.pass ?? '' } : undefined,
    ignoreTLS: loopback && !smtp.secure,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    async send(message) {
      await transport.sendMail({ from: smtp.from, ...message });
    },
  };
}
