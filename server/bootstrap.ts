import pg from 'pg';
import type { Env } from './config/env';
import { createDataSource } from './db/data-source';
import type { AppDeps } from './deps';
import { createMailer } from './mail/mailer';

/** Database first, then everything that depends on it; the app is built from these. */
export async function buildDeps(env: Env): Promise<AppDeps> {
  if (!env.SMTP_URL) throw new Error('SMTP_URL is not set: start the local mail catcher first.');
  const dataSource = await createDataSource(env.DATABASE_URL).initialize();
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 10 });
  const mailer = createMailer(env.SMTP_URL, env.MAIL_FROM);
  return { env, dataSource, pool, mailer };
}

export async function closeDeps(deps: AppDeps): Promise<void> {
  deps.mailer.close();
  await deps.pool.end();
  await deps.dataSource.destroy();
}
