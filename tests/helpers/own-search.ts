import { startSearchStandin, type RunningSearchStandin } from '../../server/search-standin/server';
import { makeUser, TEST_PASSWORD } from './factories';
import { createTestApp, signIn, type Agent, type TestApp } from './test-app';

/**
 * A test app on a search service of the test's own, so that stopping it leaves the other tests'
 * alone. `down` starts it stopped.
 */
export class OwnSearchApp {
  private constructor(
    readonly t: TestApp,
    private standin: RunningSearchStandin,
    private running: boolean,
  ) {}

  static async start(opts: { down?: boolean; env?: Parameters<typeof createTestApp>[0] } = {}): Promise<OwnSearchApp> {
    const standin = await startSearchStandin({ port: 0 });
    if (opts.down) await standin.close();
    const t = await createTestApp({ MEILI_HOST: standin.url, MEILI_API_KEY: '', ...opts.env });
    return new OwnSearchApp(t, standin, !opts.down);
  }

  /** A new user of that role, signed in. */
  async signInAs(role: 'buyer' | 'admin'): Promise<{ agent: Agent; token: string }> {
    return signIn(this.t.app, (await makeUser(this.t.deps.dataSource, role)).email, TEST_PASSWORD);
  }

  async stopSearch(): Promise<void> {
    await this.standin.close();
    this.running = false;
  }

  /** Back on the same address, with the index set up again but empty, as a service that lost its data. */
  async restartSearch(): Promise<void> {
    this.standin = await startSearchStandin({ port: Number(new URL(this.standin.url).port) });
    this.running = true;
    await this.t.deps.search.configure();
  }

  async close(): Promise<void> {
    await this.t.close();
    if (this.running) await this.standin.close();
  }
}
