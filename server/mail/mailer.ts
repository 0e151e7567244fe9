import nodemailer from 'nodemailer';
import type { Knex } from 'knex';
import type { Config } from '../config';
import type { Logger } from '../lib/logger';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  /** The one link the mail is about; the local outbox prints it to the server log. */
  link?: string;
}

export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

/**
 * Nodemailer either way. With SMTP (`MAIL_TRANSPORT=smtp`) mail goes to the configured server.
 * The default is a local stand-in for a mail service: nodemailer's JSON transport builds the
 * message, which is kept in the `outbox` table and printed to the server log for the operator.
 * No HTTP route shows it, save the loopback-only development view when switched on.
 */
export function createMailer(config: Config, db: Knex, log: Logger): Mailer {
  if (config.MAIL_TRANSPORT === 'smtp') {
    const transport = nodemailer.createTransport(config.SMTP_URL);
    return {
      async send(message) {
        await transport.sendMail({
          from: config.MAIL_FROM,
          to: message.to,
          subject: message.subject,
          text: message.text,
        });
        log.info(`Mail sent to ${message.to}: ${message.subject}`);
      },
    };
  }
  const transport = nodemailer.createTransport({ jsonTransport: true });
  return {
    async send(message) {
      const info = await transport.sendMail({
        from: config.MAIL_FROM,
        to: message.to,
        subject: message.subject,
        text: message.text,
      });
      await db('outbox').insert({
        to_address: message.to,
        subject: message.subject,
        body: message.text,
        raw: String((info as { message?: unknown }).message ?? ''),
      });
      log.info(
        `Mail (local outbox) to ${message.to}: ${message.subject}` +
          (message.link ? `\n  ${message.link}` : ''),
      );
    },
  };
}
