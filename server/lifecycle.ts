import type { Server, ServerResponse } from 'node:http';
import type { Logger } from './observability/logger';

/** Whether the process has been asked to stop: /readyz answers 503 from then on. */
export interface Lifecycle {
  stopping: boolean;
}

export interface Drainable {
  /**
   * Closes the listener (new connections are refused), lets the requests under way finish — their
   * keep-alive connections close after them — and cuts what is left after `timeoutMs`.
   * Resolves with how many requests were cut.
   */
  drain(timeoutMs: number): Promise<number>;
}

/** Wraps a listening server so that it can be drained (Node's own close and connection calls). */
export function drainable(server: Server): Drainable {
  const underWay = new Set<ServerResponse>();
  let draining = false;
  const closeAfter = (res: ServerResponse): void => {
    if (!res.headersSent) res.setHeader('Connection', 'close');
  };
  server.on('request', (_req, res: ServerResponse) => {
    underWay.add(res);
    res.once('close', () => underWay.delete(res));
    // A request that came in on an open keep-alive connection after the listener closed is the last on it.
    if (draining) closeAfter(res);
  });
  return {
    drain(timeoutMs) {
      draining = true;
      for (const res of underWay) closeAfter(res);
      return new Promise((resolve) => {
        let cut = 0;
        const timer = setTimeout(() => {
          cut = underWay.size;
          server.closeAllConnections();
        }, timeoutMs);
        server.close(() => {
          clearTimeout(timer);
          resolve(cut);
        });
        server.closeIdleConnections();
      });
    },
  };
}

/**
 * Runs `stop` once on SIGTERM or SIGINT, then exits 0. Ctrl-C pressed a second time, or a stop that
 * hangs past `hardLimitMs`, exits 1 at once; a SIGTERM during the stop changes nothing (`npm start`
 * sends one after the terminal's SIGINT).
 */
export function onStopSignals(logger: Logger, hardLimitMs: number, stop: (signal: string) => Promise<void>): void {
  let first: NodeJS.Signals | null = null;
  const handle = (signal: NodeJS.Signals): void => {
    if (first) {
      if (signal !== 'SIGINT' || first !== 'SIGINT') return;
      logger.warn({ signal }, 'second Ctrl-C: exiting now');
      process.exit(1);
    }
    first = signal;
    logger.info({ signal }, 'stopping: draining requests and jobs');
    setTimeout(() => {
      logger.error({ hardLimitMs }, 'stop took too long: exiting');
      process.exit(1);
    }, hardLimitMs).unref();
    stop(signal).then(
      () => {
        logger.info('stopped');
        process.exit(0);
      },
      (err: unknown) => {
        logger.error({ err }, 'stop failed');
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', handle);
  process.on('SIGINT', handle);
}
