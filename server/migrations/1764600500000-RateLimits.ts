import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Rate-limit counters in PostgreSQL, so every app server counts the same failures and calls.
 * The layout is rate-limiter-flexible's own for RateLimiterPostgres (key, points, expire in ms),
 * made here rather than by the library so the schema stays in migrations.
 */
export class RateLimits1764600500000 implements MigrationInterface {
  name = 'RateLimits1764600500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE rate_limit (
        key varchar(255) PRIMARY KEY,
        points integer NOT NULL DEFAULT 0,
        expire bigint
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE rate_limit`);
  }
}
