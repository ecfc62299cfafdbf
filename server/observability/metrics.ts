import pg from 'pg';
import { collectDefaultMetrics, Gauge, Histogram, Registry } from 'prom-client';
import type { DataSource } from 'typeorm';
import { JOB_NAMES } from '../../shared/schemas/jobs';
import { countQueuedJobs, QUEUE_DEPTH_STATES } from '../repositories/jobs.repository';
import type { Logger } from './logger';

export interface MetricSources {
  dataSource: DataSource;
  /** The app's own pg pool (sessions, COPY). */
  pool: pg.Pool;
  /** The job queue's pool, when the queue has one open. */
  jobsPool: () => pg.Pool | null;
  logger: Logger;
}

export interface Metrics {
  registry: Registry;
  /** One finished HTTP request, by its route pattern, never its raw URL. */
  observeRequest(labels: { method: string; route: string; status: number }, seconds: number): void;
}

/** Seconds: from a cached answer to a slow price-list commit. */
const LATENCY_BUCKETS = [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10, 30];

/** Every pg pool of the process by name: TypeORM's primary (and replicas, when set up), ours, the queue's. */
function pools(sources: MetricSources): [string, pg.Pool][] {
  const out: [string, pg.Pool][] = [['app', sources.pool]];
  const driver: unknown = sources.dataSource.driver;
  const master: unknown = typeof driver === 'object' && driver !== null ? Reflect.get(driver, 'master') : null;
  const slaves: unknown = typeof driver === 'object' && driver !== null ? Reflect.get(driver, 'slaves') : null;
  if (master instanceof pg.Pool) out.push(['typeorm', master]);
  if (Array.isArray(slaves)) slaves.forEach((s: unknown, i) => s instanceof pg.Pool && out.push([`typeorm-replica-${i}`, s]));
  const jobs = sources.jobsPool();
  if (jobs) out.push(['jobs', jobs]);
  return out;
}

/**
 * The process's Prometheus metrics (prom-client) in a registry of its own: Node's defaults, HTTP
 * latency by route pattern and status class, job queue depth by queue and state (read from
 * pg-boss's table at each scrape) and the pg pools' connections.
 */
export function createMetrics(sources: MetricSources): Metrics {
  const registry = new Registry();
  collectDefaultMetrics({ register: registry });

  const latency = new Histogram({
    name: 'http_request_duration_seconds',
    help: 'HTTP request latency, by method, Express route pattern and status class',
    labelNames: ['method', 'route', 'status_class'],
    buckets: LATENCY_BUCKETS,
    registers: [registry],
  });

  const poolGauge = (name: string, help: string, read: (p: pg.Pool) => number): void => {
    new Gauge({
      name,
      help,
      labelNames: ['pool'],
      registers: [registry],
      collect() {
        this.reset();
        for (const [pool, p] of pools(sources)) this.set({ pool }, read(p));
      },
    });
  };
  poolGauge('arcwise_db_pool_connections', 'Open connections of a pg pool', (p) => p.totalCount);
  poolGauge('arcwise_db_pool_idle', 'Idle connections of a pg pool', (p) => p.idleCount);
  poolGauge('arcwise_db_pool_waiting', 'Queries waiting for a connection of a pg pool', (p) => p.waitingCount);

  // After the pool gauges: a scrape reads the pools before its own query takes a connection.
  new Gauge({
    name: 'arcwise_job_queue_jobs',
    help: 'Follow-up jobs in the queue, by queue and state (created, retry, active, failed)',
    labelNames: ['queue', 'state'],
    registers: [registry],
    async collect() {
      this.reset();
      try {
        const counts = new Map((await countQueuedJobs(sources.dataSource.manager)).map((r) => [`${r.name} ${r.state}`, r.jobs]));
        for (const queue of JOB_NAMES)
          for (const state of QUEUE_DEPTH_STATES) this.set({ queue, state }, counts.get(`${queue} ${state}`) ?? 0);
      } catch (err) {
        // A scrape still answers with the rest; the gauge is left out until the database is back.
        sources.logger.warn({ err }, 'metrics: job queue depth unavailable');
      }
    },
  });

  return {
    registry,
    observeRequest({ method, route, status }, seconds) {
      latency.observe({ method, route, status_class: `${Math.floor(status / 100)}xx` }, seconds);
    },
  };
}
