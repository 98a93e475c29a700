import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/** nodemailer over SMTP_URL (the local fake in development, a relay in production). */
export function createMailer(smtpUrl: string, from: string) {
  const url = new URL(smtpUrl);
  const transport = nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (url.protocol === 'smtps:' ? 465 : 587)),
    secure: url.protocol === 'smtps:',
    ignoreTLS: url.hostname === '127.0.0.1' || url.hostname === 'localhost',
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return {
    async send(mail: OutgoingMail): Promise<void> {
      await transport.sendMail({ from, ...mail });
    },
    async check(): Promise<boolean> {
      try {
        await transport.verify();
        return true;
      } catch {
        return false;
      }
    },
    close: () => transport.close(),
  };
}

export type Mailer = ReturnType<typeof createMailer>;
