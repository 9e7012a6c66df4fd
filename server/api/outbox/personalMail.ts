/** Read the local mail server's kept messages to one address straight from the data folder's database (the CLI's `mail`). */
import fs from 'node:fs';
import path from 'node:path';
import type { OutboxMessage } from '@shared/schemas/invitations';
import { openDatabase } from '../../db/sequelize';
import { initModels } from '../../db/models';
import { listMailTo } from './outboxRepository';

/** The newest `limit` messages to `address` in `<dataDir>/heatloom.sqlite`; null when that database does not exist. */
export async function readMailTo(dataDir: string, address: string, limit: number): Promise<OutboxMessage[] | null> {
  if (!fs.existsSync(path.join(dataDir, 'heatloom.sqlite'))) return null;
  const sequelize = await openDatabase(dataDir);
  try {
    initModels(sequelize);
    return await listMailTo(address, limit);
  } finally {
    await sequelize.close();
  }
}

/** Messages as plain text for a terminal, newest first. */
export function mailText(address: string, messages: OutboxMessage[]): string {
  if (!messages.length) return `No mail to ${address} kept by the local mail server.`;
  return messages
    .map((m) => [`Date:    ${m.date}`, `From:    ${m.from}`, `To:      ${m.to}`, `Subject: ${m.subject}`, '', m.text.trimEnd()].join('\n'))
    .join('\n\n' + '-'.repeat(72) + '\n\n');
}
