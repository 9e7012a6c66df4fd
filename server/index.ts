/** Starts Heatloom: builds the app, listens, prints the URL and demo hint, shuts down cleanly on SIGINT/SIGTERM. */
import { loadConfig } from './config';
import { createApp } from './app';
import { demoUsers } from './db/seeders/demoUsers';

async function main(): Promise<void> {
  const config = loadConfig();
  const built = await createApp(config);
  const { logger } = built;
  const server = built.app.listen(config.port, config.host, () => {
    const shown = config.host === '0.0.0.0' ? 'localhost' : config.host;
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    logger.info(`Heatloom is running at http://${shown}:${port} (data in ${config.dataDir})`);
    if (built.fakeSmtpPort !== null) logger.info(`Local SMTP server on port ${built.fakeSmtpPort}; owners read workspace mail in the Outbox page, personal mail (password resets) with: npm run -s cli -- mail --to ADDRESS`);
    logger.info(`Demo sign-in: ${demoUsers.engineer.email} / ${demoUsers.engineer.password} (see README for the other demo users)`);
  });
  server.on('error', (err) => {
    logger.error('Could not listen', err);
    void built.close().finally(() => process.exit(1));
  });

  let stopping = false;
  const stop = (signal: string): void => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal} received, shutting down`);
    const force = setTimeout(() => process.exit(1), 10000);
    force.unref();
    server.close(() => {
      built
        .close()
        .then(() => process.exit(0))
        .catch((err) => {
          logger.error('Error while closing', err);
          process.exit(1);
        });
    });
    server.closeIdleConnections();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((err: Error) => {
  process.stderr.write(`Heatloom failed to start: ${err.message}\n`);
  process.exit(1);
});
