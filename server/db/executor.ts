import type pg from 'pg';
import { EntityManager } from 'typeorm';
import { z } from 'zod';

/**
 * Where a repository function runs its SQL: `ds.manager` (the primary), a transaction's manager
 * (`ds.transaction(m => …)`, so a service composes several repository calls in one transaction),
 * a replica's manager (`readOnly`), or a pg client holding a COPY transaction.
 */
export type Executor = EntityManager | pg.ClientBase;

/** A query's rows did not have the shape its repository declared: a defect here, never a bad request. */
export class RowShapeError extends Error {
  constructor(sql: string, cause: z.ZodError) {
    const head = sql.replace(/\s+/g, ' ').trim().slice(0, 80);
    const issue = cause.issues[0];
    super(`rows of "${head}…" do not match their schema: ${issue ? `${issue.path.join('.')}: ${issue.message}` : cause.message}`);
    this.name = 'RowShapeError';
  }
}

interface Outcome {
  rows: unknown[];
  /** Rows an INSERT, UPDATE or DELETE touched; the row count for a SELECT. */
  count: number;
}

async function run(ex: Executor, sql: string, params: readonly unknown[]): Promise<Outcome> {
  if (ex instanceof EntityManager) {
    // TypeORM's structured result: the same shape for a SELECT and an UPDATE … RETURNING.
    const runner = ex.queryRunner ?? ex.connection.createQueryRunner();
    try {
      const result = await runner.query(sql, [...params], true);
      const rows: unknown[] = Array.isArray(result.records) ? result.records : [];
      return { rows, count: result.affected ?? rows.length };
    } finally {
      if (!ex.queryRunner) await runner.release();
    }
  }
  const result = await ex.query(sql, [...params]);
  return { rows: result.rows, count: result.rowCount ?? result.rows.length };
}

function parseRows<S extends z.ZodType>(schema: S, sql: string, rows: unknown[]): z.output<S>[] {
  const parsed = z.array(schema).safeParse(rows);
  if (!parsed.success) throw new RowShapeError(sql, parsed.error);
  return parsed.data;
}

/** Runs a query and parses every row with the schema: the only way a query's rows reach the code. */
export async function queryRows<S extends z.ZodType>(
  ex: Executor,
  schema: S,
  sql: string,
  params: readonly unknown[] = [],
): Promise<z.output<S>[]> {
  return parseRows(schema, sql, (await run(ex, sql, params)).rows);
}

/**
 * queryRows as a named prepared statement: each connection plans it once and, after a few runs,
 * reuses a generic plan. For a hot query whose planning costs more than its run (a recursive CTE
 * over indexed lookups); the name must be unique to this SQL text.
 */
export async function queryRowsPrepared<S extends z.ZodType>(
  ex: Executor,
  schema: S,
  name: string,
  sql: string,
  params: readonly unknown[] = [],
): Promise<z.output<S>[]> {
  const config = { name, text: sql, values: [...params] };
  if (!(ex instanceof EntityManager)) return parseRows(schema, sql, (await ex.query(config)).rows);
  const runner = ex.queryRunner ?? ex.connection.createQueryRunner();
  try {
    // The runner's own pg connection (the replica's under readOnly), asked directly: TypeORM cannot name a statement.
    const client = (await runner.connect()) as pg.ClientBase;
    return parseRows(schema, sql, (await client.query(config)).rows);
  } finally {
    if (!ex.queryRunner) await runner.release();
  }
}

/** The first row, parsed, or null when there is none. */
export async function queryOne<S extends z.ZodType>(
  ex: Executor,
  schema: S,
  sql: string,
  params: readonly unknown[] = [],
): Promise<z.output<S> | null> {
  return (await queryRows(ex, schema, sql, params))[0] ?? null;
}

const countRow = z.object({ n: z.number().int() });

/** A query answering one row `n` (`SELECT count(*)::int AS n …`). */
export async function queryCount(ex: Executor, sql: string, params: readonly unknown[] = []): Promise<number> {
  return (await queryOne(ex, countRow, sql, params))?.n ?? 0;
}

/** A statement whose rows nobody reads; answers how many rows it touched. */
export async function execute(ex: Executor, sql: string, params: readonly unknown[] = []): Promise<number> {
  return (await run(ex, sql, params)).count;
}

const idRow = z.object({ id: z.string() });

/** A query answering rows of one column `id`. */
export async function queryIds(ex: Executor, sql: string, params: readonly unknown[] = []): Promise<string[]> {
  return (await queryRows(ex, idRow, sql, params)).map((r) => r.id);
}

/** An INSERT … RETURNING id of one row. */
export async function insertReturningId(ex: Executor, sql: string, params: readonly unknown[] = []): Promise<string> {
  const id = (await queryIds(ex, sql, params))[0];
  if (id === undefined) throw new Error(`"${sql.slice(0, 60)}…" returned no id`);
  return id;
}

/** True when the query answers at least one row. */
export async function queryExists(ex: Executor, sql: string, params: readonly unknown[] = []): Promise<boolean> {
  return (await run(ex, sql, params)).rows.length > 0;
}
