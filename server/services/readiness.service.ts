import type { ReadinessChecks } from '../../shared/schemas/ops';
import type { AppDeps } from '../deps';

export const CHECK_OK = 'ok';
/** A dependency that does not answer within this is as good as down for a load balancer. */
const CHECK_TIMEOUT_MS = 2_000;

async function check(probe: () => Promise<unknown>): Promise<string> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${CHECK_TIMEOUT_MS} ms`)), CHECK_TIMEOUT_MS);
  });
  try {
    await Promise.race([probe(), timeout]);
    return CHECK_OK;
  } catch (err) {
    return err instanceof Error ? err.message : String(err);
  } finally {
    clearTimeout(timer);
  }
}

/** The database answers a `SELECT 1` and the search service its health call, both at once. */
export async function checkReadiness(deps: Pick<AppDeps, 'dataSource' | 'search'>): Promise<ReadinessChecks> {
  const [database, search] = await Promise.all([check(() => deps.dataSource.query('SELECT 1')), check(() => deps.search.client.health())]);
  return { database, search };
}

export const isReady = (checks: ReadinessChecks): boolean => Object.values(checks).every((c) => c === CHECK_OK);
