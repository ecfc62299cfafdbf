import 'reflect-metadata';
import request from 'supertest';
import { createApp } from '../../server/app';
import { buildDeps } from '../../server/bootstrap';
import { loadEnv } from '../../server/config/env';

/**
 * A child process of tests/server/price-lists/crash-safety.test.ts: the real app on the test
 * database, signed in as a buyer, commits one staged list through the API. It boots and signs in
 * first ("ready"), then takes the list's id on stdin, so the test can start the next child while
 * the current one runs; it never exits by itself: the test kills it with SIGKILL at a random
 * moment after "committing", then reads the database.
 *
 * Environment: the app's (DATABASE_URL, SMTP_URL, MEILI_HOST …) plus CRASH_EMAIL and CRASH_PASSWORD.
 */
function firstLine(): Promise<string> {
  return new Promise((resolve) => {
    let text = '';
    process.stdin.setEncoding('utf8');
    process.stdin.on('data', (chunk: string) => {
      text += chunk;
      const end = text.indexOf('\n');
      if (end !== -1) resolve(text.slice(0, end).trim());
    });
  });
}

async function main(): Promise<void> {
  const deps = await buildDeps(loadEnv(process.env));
  const agent = request.agent(createApp(deps));
  const token = ((await agent.get('/api/auth/csrf').expect(200)).body as { token: string }).token;
  await agent
    .post('/api/auth/login')
    .set('x-csrf-token', token)
    .send({ email: process.env.CRASH_EMAIL, password: process.env.CRASH_PASSWORD })
    .expect(200);
  // Sign-in replaced the session the first token was bound to.
  const sessionToken = ((await agent.get('/api/auth/csrf').expect(200)).body as { token: string }).token;
  process.stdout.write('ready\n');
  const listId = await firstLine();
  process.stdout.write('committing\n');
  const res = await agent.post(`/api/price-lists/${listId}/commit`).set('x-csrf-token', sessionToken);
  process.stdout.write(`done ${res.status}\n`);
  // Stays up until killed, like a server.
  setInterval(() => undefined, 60_000);
}

main().catch((err: unknown) => {
  process.stderr.write(`${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
  process.exit(1);
});
