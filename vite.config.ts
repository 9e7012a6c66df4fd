/** Vite build of the Vue client; the Express server serves dist/ in production and proxies nothing. */
import { fileURLToPath, URL } from 'node:url';
import { defineConfig } from 'vite';
import vue from '@vitejs/plugin-vue';

export default defineConfig({
  plugins: [vue()],
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  server: { proxy: { '/api': 'http://127.0.0.1:3000', '/outbox': 'http://127.0.0.1:3000' } },
  build: { outDir: 'dist', chunkSizeWarningLimit: 1500 },
});
