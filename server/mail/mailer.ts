import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** nodemailer over SMTP: the real server from SMTP_URL, or the local catcher. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const transport: Transporter = nodemailer.createTransport(smtpUrl);
  return {
    async send(mail) {
      await transport.sendMail({ from, ...mail });
    },
    close() {
      transport.close();
    },
  };
}

/** Escapes text for the HTML part of a message. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);
}
