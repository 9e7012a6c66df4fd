/** The local SMTP server: stores parsed mail with its workspace header; takes a free port when the configured one is busy. */
import net from 'node:net';
import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { startFakeSmtpOrFallback, type ReceivedMail } from '../../../server/lib/fakeSmtp';
import { createLogger } from '../../../server/lib/logger';

describe('fake SMTP server', () => {
  it('parses a message and falls back to a free port when its port is taken', async () => {
    const blocker = net.createServer();
    await new Promise<void>((resolve) => blocker.listen(0, '127.0.0.1', () => resolve()));
    const busy = (blocker.address() as net.AddressInfo).port;
    const got: ReceivedMail[] = [];
    const fake = await startFakeSmtpOrFallback(busy, async (m) => void got.push(m), createLogger('silent'));
    try {
      expect(fake.port).not.toBe(busy);
      const transport = nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
      await transport.sendMail({ from: 'a@x.example', to: 'b@y.example', subject: 'Hello', text: 'Body', headers: { 'x-heatloom-workspace': '7' } });
      transport.close();
      expect(got).toHaveLength(1);
      expect(got[0]).toMatchObject({ workspaceId: 7, to: 'b@y.example', from: 'a@x.example', subject: 'Hello' });
      expect(got[0].text.trim()).toBe('Body');
    } finally {
      await fake.close();
      blocker.close();
    }
  });
});
