// A local fake SMTP server (smtp-server): accepts every message on loopback and stores it in
// PostgreSQL, where admins read it on the outbox page. Nothing leaves the machine.
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../db/client';
import { mailMessages } from '../db/schema';

export type FakeSmtp = { port: number; close: () => Promise<void> };

const maxMessageBytes = 5 * 1024 * 1024;

async function readStream(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk));
  return Buffer.concat(chunks);
}

export async function storeMessage(db: Db, raw: Buffer, envelopeTo: string[]) {
  const parsed = await simpleParser(raw);
  const from = parsed.from?.text ?? '';
  await db.insert(mailMessages).values({
    sender: from,
    recipients: envelopeTo,
    subject: parsed.subject ?? '',
    text: parsed.text ?? '',
    html: typeof parsed.html === 'string' ? parsed.html : null,
    raw: raw.toString('utf8'),
  });
}

export function startFakeSmtp(db: Db, port: number): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: maxMessageBytes,
    logger: false,
    onData(stream, session, callback) {
      const to = session.envelope.rcptTo.map((r) => r.address);
      readStream(stream)
        .then((raw) => storeMessage(db, raw, to))
        .then(() => callback(), (error: Error) => callback(error));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      const address = server.server.address();
      const actual = typeof address === 'object' && address ? address.port : port;
      resolve({ port: actual, close: () => new Promise<void>((done) => server.close(() => done())) });
    });
  });
}
