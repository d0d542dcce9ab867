import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/**
 * Sends mail through SMTP with nodemailer. In development and tests the SMTP server is the
 * local fake (server/mail/fake-smtp.ts); in production it is the provider's relay.
 */
export function createMailer(opts: { host: string; port: number; from: string }): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: opts.host,
    port: opts.port,
    secure: false,
    ignoreTLS: opts.host === '127.0.0.1' || opts.host === 'localhost',
    connectionTimeout: 5_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: opts.from, ...mail });
    },
    close() {
      transport.close();
    },
  };
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A plain mail with one call to action: text and a minimal HTML alternative. */
export function actionMail(to: string, subject: string, intro: string, actionLabel: string, url: string): OutgoingMail {
  const text = `${intro}\n\n${actionLabel}: ${url}\n\nIf you did not ask for this, ignore this message.\n— Nightloom`;
  const html = `<p>${escapeHtml(intro)}</p><p><a href="${escapeHtml(url)}">${escapeHtml(actionLabel)}</a></p><p>If you did not ask for this, ignore this message.<br>— Nightloom</p>`;
  return { to, subject, text, html };
}
