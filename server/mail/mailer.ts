import nodemailer from 'nodemailer';
import type { Knex } from 'knex';
import type { Config } from '../config';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
  /** Held mails, newest first, when the local outbox transport is on; null otherwise. */
  outbox(): Promise<OutboxMail[] | null>;
}

export interface OutboxMail {
  id: number;
  to: string;
  subject: string;
  text: string;
  createdAt: string;
}

/**
 * Nodemailer either way: SMTP by configuration, or its JSON transport whose output is kept in
 * the `outbox` table so a developer can read what would have been sent.
 */
export function createMailer(config: Config, db: Knex): Mailer {
  const usesOutbox = config.MAIL_TRANSPORT === 'outbox';
  const transport = usesOutbox
    ? nodemailer.createTransport({ jsonTransport: true })
    : nodemailer.createTransport(config.SMTP_URL);
  return {
    async send(message) {
      const info = await transport.sendMail({ from: config.MAIL_FROM, ...message });
      if (usesOutbox) {
        await db('outbox').insert({
          to_address: message.to,
          subject: message.subject,
          body: message.text,
          raw: String((info as { message?: unknown }).message ?? ''),
        });
      }
    },
    async outbox() {
      if (!usesOutbox) return null;
      const rows = await db('outbox').orderBy('id', 'desc').limit(100);
      return rows.map((r) => ({
        id: r.id,
        to: r.to_address,
        subject: r.subject,
        text: r.body,
        createdAt: r.created_at,
      }));
    },
  };
}
