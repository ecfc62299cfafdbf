import request from 'supertest';
import { SESSION_COOKIE } from '../../server/middleware/session';
import type { Agent } from './test-app';

const csrfToken = async (agent: Agent): Promise<string> =>
  ((await agent.get('/api/auth/csrf').expect(200)).body as { token: string }).token;

export interface SignedInAt {
  agent: Agent;
  token: string;
  /** `arcwise.sid=…` as the server set it at sign-in: what a browser sends to any server behind the balancer. */
  sessionCookie: string;
}

/**
 * Signs in over real HTTP at `baseUrl` (a server listening elsewhere, not an app in this process)
 * and returns a cookie-keeping agent with a CSRF token fetched after sign-in, as the client does.
 */
export async function signInAt(baseUrl: string, email: string, password: string): Promise<SignedInAt> {
  const agent = request.agent(baseUrl);
  // The token first: an agent's request takes the cookies it holds when the request is made.
  const before = await csrfToken(agent);
  const res = await agent.post('/api/auth/login').set('x-csrf-token', before).send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in at ${baseUrl}: ${res.status} ${JSON.stringify(res.body)}`);
  const setCookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  const sessionCookie = setCookie.map((c) => c.split(';')[0]!).find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  if (!sessionCookie) throw new Error(`no ${SESSION_COOKIE} cookie set at sign-in`);
  return { agent, token: await csrfToken(agent), sessionCookie };
}
