import { startMailCatcher, type MailCatcher } from './mail/catcher';
import { startSearchStandin } from './search-standin/server';

export interface LocalServices {
  /** Environment entries that point the app at the services started here. */
  env: Record<string, string>;
  close(): Promise<void>;
}

/** Starts the local mail catcher (SMTP_URL unset) and search stand-in (MEILI_HOST unset) on loopback. */
export async function startLocalServices(source: NodeJS.ProcessEnv): Promise<LocalServices> {
  const env: Record<string, string> = {};
  const closers: (() => Promise<void>)[] = [];
  if (!source.SMTP_URL) {
    const catcher: MailCatcher = await startMailCatcher();
    env.SMTP_URL = catcher.smtpUrl;
    env.MAIL_CATCHER_URL = catcher.httpUrl;
    closers.push(() => catcher.close());
    console.log(`[arcwise] local mail catcher on ${catcher.smtpUrl}; messages on the Outbox page`);
  }
  if (!source.MEILI_HOST) {
    const standin = await startSearchStandin({ port: 0 });
    env.MEILI_HOST = standin.url;
    closers.push(() => standin.close());
    console.log(`[arcwise] local search stand-in on ${standin.url}`);
  }
  return {
    env,
    async close() {
      for (const c of closers.reverse()) await c();
    },
  };
}
