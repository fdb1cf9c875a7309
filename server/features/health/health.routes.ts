import { Router } from 'express';
import { sql } from 'drizzle-orm';
import { healthSchema, serverConfigSchema } from '../../../shared/schemas/auth';
import { devMailListSchema } from '../../../shared/schemas/team';
import type { Db } from '../../db/client';
import { notFound } from '../../lib/errors';
import type { DevInbox } from '../mail/fake-smtp';

export const VERSION = '0.1.0';

export function healthRouter(deps: { db: Db; devInbox: DevInbox | undefined }): Router {
  const router = Router();

  router.get('/health', async (_req, res) => {
    const up = await deps.db.execute(sql`select 1`).then(
      () => true,
      () => false,
    );
    res.status(up ? 200 : 503).json(healthSchema.parse({ ok: up, db: up ? 'up' : 'down' }));
  });

  router.get('/config', (_req, res) => {
    res.json(serverConfigSchema.parse({ devInbox: deps.devInbox !== undefined, version: VERSION }));
  });

  router.get('/dev/mails', (_req, res) => {
    if (!deps.devInbox) throw notFound('The dev inbox (real SMTP is configured)');
    res.json(devMailListSchema.parse({ mails: deps.devInbox.list() }));
  });

  return router;
}
