import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../db/client';
import { caughtMail } from '../db/schema/mail';
import { linksIn } from './links';

export interface MailCatcher {
  url: string;
  close(): Promise<void>;
}

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

/**
 * A local SMTP server on a free loopback port that stores every message in the database, so
 * invitations and resets work in development, the demo and tests without a real mail server.
 * A message is stored before the server answers 250, so a resolved send means a stored row.
 */
export async function startMailCatcher(db: Database): Promise<MailCatcher> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    banner: 'Gripline mail catcher',
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const text = parsed.text ?? '';
          db.insert(caughtMail)
            .values({
              messageId: parsed.messageId ?? null,
              fromAddress: addresses(parsed.from).join(', '),
              toAddresses: JSON.stringify(addresses(parsed.to)),
              subject: parsed.subject ?? '(no subject)',
              textBody: text,
              links: JSON.stringify(linksIn(text)),
            })
            .run();
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => resolve());
  });
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}?ignoreTLS=true`,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
