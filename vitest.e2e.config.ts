/** Browser tests: headless Debian chromium via playwright-core against the built app on a free port. */
import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { alias: { '@shared': fileURLToPath(new URL('./shared', import.meta.url)) } },
  test: {
    include: ['tests/e2e/**/*.e2e.ts'],
    globalSetup: ['tests/e2e/globalSetup.ts'],
    fileParallelism: false,
    testTimeout: 90000,
    hookTimeout: 120000,
    pool: 'forks',
  },
});
