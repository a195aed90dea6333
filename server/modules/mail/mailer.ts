import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../../config.ts';
import { FakeSmtp } from './fake-smtp.ts';

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: Mail): Promise<void>;
  /** The local fake's outbox, when mail goes to it; undefined with a real SMTP server. */
  outbox: FakeSmtp | undefined;
  close(): Promise<void>;
}

/** Real SMTP from the configuration, or else the in-process fake. */
export async function createMailer(config: Pick<Config, 'smtp' | 'mailFrom'>): Promise<Mailer> {
  let outbox: FakeSmtp | undefined;
  let transport: Transporter;
  if (config.smtp) {
    const { host, port, secure, user, pass } = config.smtp;
    transport = nodemailer.createTransport({ host, port, secure, ...(user ? { auth: { user, pass } } : {}) });
  } else {
    outbox = new FakeSmtp();
    const port = await outbox.listen();
    transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }
  return {
    outbox,
    async send(mail) {
      await transport.sendMail({ from: config.mailFrom, ...mail });
    },
    async close() {
      transport.close();
      await outbox?.close();
    },
  };
}
