import nodemailer from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string | undefined;
  pass?: string | undefined;
  from: string;
  /** The local fake server speaks plain SMTP only. */
  ignoreTls?: boolean;
}

export function createSmtpMailer(settings: SmtpSettings): Mailer {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    ignoreTLS: settings.ignoreTls ?? false,
    auth: settings.user ? { user: settings.user, pass: settings.pass ?? '' } : undefined,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: settings.from, ...mail });
    },
  };
}
