// The outbox page: messages the local fake SMTP server received, newest first.
import { arrayContains, count, desc, eq } from 'drizzle-orm';
import type { MailMessage, MailSummary, Page } from '../../../shared/schemas/api-types';
import type { Db } from '../../db/client';
import { mailMessages } from '../../db/schema';
import { notFound } from '../../errors';

type Row = typeof mailMessages.$inferSelect;

const summary = (m: Row): MailSummary => ({
  id: m.id,
  receivedAt: m.receivedAt.toISOString(),
  sender: m.sender,
  recipients: m.recipients,
  subject: m.subject,
});

export async function listOutbox(db: Db, q: { limit: number; offset: number; to?: string }): Promise<Page<MailSummary>> {
  const where = q.to ? arrayContains(mailMessages.recipients, [q.to.toLowerCase()]) : undefined;
  const rows = await db.select().from(mailMessages).where(where).orderBy(desc(mailMessages.receivedAt)).limit(q.limit).offset(q.offset);
  const [{ total }] = await db.select({ total: count() }).from(mailMessages).where(where);
  return { total, items: rows.map(summary) };
}

export async function readMessage(db: Db, id: string): Promise<MailMessage> {
  const m = await db.query.mailMessages.findFirst({ where: eq(mailMessages.id, id) });
  if (!m) throw notFound('That message');
  return { ...summary(m), text: m.text, html: m.html };
}
