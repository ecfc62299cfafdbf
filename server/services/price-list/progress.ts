import type { DataSource } from 'typeorm';
import type { PriceListProgress } from '../../../shared/schemas/price-lists';
import { setProgress } from '../../repositories/price-lists.repository';

/** Rows between two progress writes: often enough for a progress bar, rare enough to cost nothing. */
const EVERY_ROWS = 2000;

/**
 * Keeps price_list.progress current while a file is read, so GET /api/price-lists/:id shows rows
 * done and bytes read. Writes go through their own connection, outside the staging transaction
 * (whose rows nobody else can see yet), one at a time: a write still running is not queued behind.
 */
export class ProgressReporter {
  private pending: Promise<void> | null = null;
  private lastRows = -EVERY_ROWS;
  private closed = false;
  listId: string | null = null;

  constructor(
    private readonly ds: DataSource,
    private readonly bytesTotal: number,
  ) {}

  /** Called by the parser every 1,000 lines. */
  readonly report = (rowsDone: number, bytesRead: number): void => {
    if (this.closed || this.listId === null || this.pending !== null || rowsDone - this.lastRows < EVERY_ROWS) return;
    this.lastRows = rowsDone;
    this.write({ phase: 'reading', rowsDone, bytesRead, bytesTotal: this.bytesTotal });
  };

  comparing(rowsDone: number): void {
    if (this.closed || this.listId === null || this.pending !== null) return;
    this.write({ phase: 'comparing', rowsDone, bytesRead: this.bytesTotal, bytesTotal: this.bytesTotal });
  }

  done(rowsDone: number): PriceListProgress {
    return { phase: 'done', rowsDone, bytesRead: this.bytesTotal, bytesTotal: this.bytesTotal };
  }

  /** Stops further writes and waits for the one running, before the staging transaction writes the row itself. */
  async close(): Promise<void> {
    this.closed = true;
    await this.pending;
  }

  private write(progress: PriceListProgress): void {
    const listId = this.listId;
    if (listId === null) return;
    this.pending = setProgress(this.ds.manager, listId, progress)
      .then(
        () => undefined,
        (err: unknown) => console.error('[arcwise] price-list progress update failed:', err),
      )
      .finally(() => {
        this.pending = null;
      });
  }
}
