/** The local fake SMTP server's outbox table. */
import { Op, col, fn, where } from 'sequelize';
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
  return rows.map(toMessage);
}

const toMessage = (m: OutboxMessageModel): OutboxMessage => ({
  id: m.id, to: m.to, from: m.from, subject: m.subject, text: m.text, html: m.html, date: m.date.toISOString(),
});

/** The bare, lower-cased addresses of a kept "To" text ("Name <a@b>, c@d" → ["a@b", "c@d"]). */
const recipients = (to: string): string[] => to.split(',').map((r) => (/<([^>]+)>/.exec(r)?.[1] ?? r).trim().toLowerCase());

/** Every kept message (personal or on behalf of a workspace) addressed to `address`, newest first. */
export async function listMailTo(address: string, limit: number): Promise<OutboxMessage[]> {
  const wanted = address.trim().toLowerCase();
  // LIKE only narrows the scan ('_' and '%' in an address widen it); the exact match is on the parsed recipients.
  const rows = await OutboxMessageModel.findAll({ where: where(fn('lower', col('to')), { [Op.like]: `%${wanted}%` }), order: [['id', 'DESC']] });
  return rows.filter((m) => recipients(m.to).includes(wanted)).slice(0, limit).map(toMessage);
}
