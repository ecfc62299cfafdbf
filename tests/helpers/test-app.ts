import 'reflect-metadata';
import type { Express } from 'express';
import request from 'supertest';
import { createApp } from '../../server/app';
import { buildDeps, closeDeps } from '../../server/bootstrap';
import { loadEnv, type Env } from '../../server/config/env';
import type { AppDeps } from '../../server/deps';
import { testServicesEnv } from './services-env';

export interface TestApp {
  app: Express;
  deps: AppDeps;
  close(): Promise<void>;
}

/**
 * The real app on the real test database and the real mail catcher, with its job workers running
 * as in `npm start`; only listening is left to supertest. Retries come after a second or two
 * (the policy's backoff from a shorter first delay) so a test can watch one happen.
 */
export async function createTestApp(overrides: Partial<Record<keyof Env, string>> = {}): Promise<TestApp> {
  const env = loadEnv({ ...process.env, ...testServicesEnv(), ...overrides });
  const deps = await buildDeps(env);
  if (env.JOB_WORKERS) await deps.jobs.startWorkers();
  return { app: createApp(deps), deps, close: () => closeDeps(deps) };
}

export type Agent = ReturnType<typeof request.agent>;

/** A cookie-keeping client with a CSRF token fetched, ready for state changes. */
export async function csrfAgent(app: Express): Promise<{ agent: Agent; token: string }> {
  const agent = request.agent(app);
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, token: (res.body as { token: string }).token };
}

/** Signs in and fetches a new CSRF token: the token is bound to the session, which sign-in replaces. */
export async function signIn(app: Express, email: string, password: string): Promise<{ agent: Agent; token: string }> {
  const { agent, token } = await csrfAgent(app);
  await agent.post('/api/auth/login').set('x-csrf-token', token).send({ email, password }).expect(200);
  const fresh = await agent.get('/api/auth/csrf').expect(200);
  return { agent, token: (fresh.body as { token: string }).token };
}
