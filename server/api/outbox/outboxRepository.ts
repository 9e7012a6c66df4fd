/** The local fake SMTP server's outbox table. */
import type { OutboxMessage } from '@shared/schemas/invitations';
import { OutboxMessageModel } from '../../db/models/records';
import type { ReceivedMail } from '../../lib/fakeSmtp';

/** Keep one received message. */
export async function storeReceivedMail(mail: ReceivedMail): Promise<void> {
  await OutboxMessageModel.create(mail);
}

/** Messages sent on behalf of a workspace, newest first. */
export async function listOutbox(workspaceId: number, limit = 200): Promise<OutboxMessage[]> {
  const rows = await OutboxMessageModel.findAll({ where: { workspaceId }, order: [['id', 'DESC']], limit });
  return rows.map((m) => ({
    id: m.id, to: m.to, from: m.from, subject: m.subject, text: m.text, html: m.html, date: m.date.toISOString(),
  }));
}
