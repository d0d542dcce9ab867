import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { devMail } from '@/db/schema';
import type { Database } from '@/db/client';

export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

function addresses(value: unknown): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((a: { value?: { address?: string }[] }) => (a.value ?? []).map((v) => v.address ?? '')).filter(Boolean);
}

/**
 * A local stand-in for the hosted SMTP relay: accepts any mail on loopback without auth and
 * stores it in the `dev_mail` table, where the admin mail page and the tests read it back.
 */
export async function startFakeSmtp(db: Database, port: number, host = '127.0.0.1'): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          await db.insert(devMail).values({
            from: addresses(parsed.from)[0] ?? '',
            to: addresses(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return { port: actualPort, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
