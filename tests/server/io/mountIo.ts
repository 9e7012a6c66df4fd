/**
 * Until server/api/routes.ts mounts ioRouter, the io tests wrap apiRoutes with it (vi.mock factory);
 * once routes.ts mounts it, the original is used unchanged.
 */
import { readFileSync } from 'node:fs';
import type { Router } from 'express';
import type { AppContext } from '../../../server/lib/context';
import { ioRouter } from '../../../server/api/io/ioRouter';

type RoutesModule = { apiRoutes: (ctx: AppContext) => Router };

/** vi.mock factory for server/api/routes. */
export async function withIoRoutes(importOriginal: () => Promise<RoutesModule>): Promise<RoutesModule> {
  const original = await importOriginal();
  if (readFileSync('server/api/routes.ts', 'utf8').includes('ioRouter')) return original;
  return {
    apiRoutes: (ctx) => {
      const r = original.apiRoutes(ctx);
      r.use(ioRouter());
      return r;
    },
  };
}
