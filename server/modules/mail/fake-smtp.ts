import { randomUUID } from 'node:crypto';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';

export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

/** How many messages the fake keeps; older ones drop off. */
const KEEP = 200;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? v.name));
}

/**
 * An SMTP server on 127.0.0.1 that accepts every message and keeps it in memory, so that
 * development and tests send real mail over SMTP without it leaving the machine.
 */
export class FakeSmtp {
  private readonly messages: OutboxMessage[] = [];
  private readonly server: SMTPServer;
  port = 0;

  constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      banner: 'Blockwright local outbox',
      size: 1024 * 1024,
      logger: false,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((mail) => {
            this.messages.unshift({
              id: randomUUID(),
              from: addresses(mail.from)[0] ?? '',
              to: addresses(mail.to),
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : null,
              receivedAt: new Date().toISOString(),
            });
            this.messages.length = Math.min(this.messages.length, KEEP);
            callback();
          })
          .catch((err: Error) => callback(err));
      },
    });
  }

  listen(): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(0, '127.0.0.1', () => {
        const address = this.server.server.address();
        this.port = typeof address === 'object' && address ? address.port : 0;
        resolve(this.port);
      });
    });
  }

  /** Newest first. */
  list(): OutboxMessage[] {
    return [...this.messages];
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
