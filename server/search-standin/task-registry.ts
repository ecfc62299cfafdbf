/**
 * Meilisearch's task queue: every write answers at once with an enqueued task and is applied
 * afterwards, one task at a time in arrival order. Tasks run on a later turn of the event loop
 * (setImmediate) so the 202 goes out first and polling requests are served between tasks.
 */
import type { JsonObject } from './field-paths';
import { toMeiliError, type MeiliErrorBody } from './meili-error';

export type TaskType =
  'indexCreation' | 'indexUpdate' | 'indexDeletion' | 'documentAdditionOrUpdate' | 'documentDeletion' | 'settingsUpdate';

export type TaskStatus = 'enqueued' | 'processing' | 'succeeded' | 'failed';

export interface EnqueuedTaskView {
  taskUid: number;
  indexUid: string | null;
  status: 'enqueued';
  type: TaskType;
  enqueuedAt: string;
}

export interface TaskView {
  uid: number;
  batchUid: number | null;
  indexUid: string | null;
  status: TaskStatus;
  type: TaskType;
  canceledBy: null;
  details: JsonObject;
  error: MeiliErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

/** A task's work; what it returns is merged into the task's details. */
export type TaskWork = () => JsonObject | void;

interface QueuedTask {
  view: TaskView;
  work: TaskWork;
}

export interface TaskListQuery {
  uids?: number[];
  statuses?: string[];
  types?: string[];
  indexUids?: string[];
  limit: number;
  from?: number;
  reverse: boolean;
}

export interface TaskList {
  results: TaskView[];
  total: number;
  limit: number;
  from: number | null;
  next: number | null;
}

function isoDuration(ms: number): string {
  return `PT${(ms / 1000).toFixed(6)}S`;
}

export class TaskRegistry {
  private readonly tasks: TaskView[] = [];
  private readonly queue: QueuedTask[] = [];
  private scheduled = false;
  private idleWaiters: Array<() => void> = [];

  enqueue(indexUid: string | null, type: TaskType, details: JsonObject, work: TaskWork): EnqueuedTaskView {
    const uid = this.tasks.length;
    const view: TaskView = {
      uid,
      batchUid: null,
      indexUid,
      status: 'enqueued',
      type,
      canceledBy: null,
      details,
      error: null,
      duration: null,
      enqueuedAt: new Date().toISOString(),
      startedAt: null,
      finishedAt: null,
    };
    this.tasks.push(view);
    this.queue.push({ view, work });
    this.schedule();
    return { taskUid: uid, indexUid, status: 'enqueued', type, enqueuedAt: view.enqueuedAt };
  }

  get(uid: number): TaskView | undefined {
    return this.tasks[uid];
  }

  /** True while a task for this index waits or runs (the stats route's `isIndexing`). */
  isIndexing(indexUid: string): boolean {
    return this.queue.some((task) => task.view.indexUid === indexUid);
  }

  /** Resolves once every task enqueued so far has finished. */
  whenIdle(): Promise<void> {
    if (this.queue.length === 0) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  list(query: TaskListQuery): TaskList {
    let matching = this.tasks.filter(
      (task) =>
        (!query.uids || query.uids.includes(task.uid)) &&
        (!query.statuses || query.statuses.includes(task.status)) &&
        (!query.types || query.types.includes(task.type)) &&
        (!query.indexUids || (task.indexUid !== null && query.indexUids.includes(task.indexUid))),
    );
    // Newest first unless reversed, and `from` is the uid to start at in that order.
    matching = query.reverse ? matching : matching.reverse();
    const from = query.from;
    if (from !== undefined) matching = matching.filter((task) => (query.reverse ? task.uid >= from : task.uid <= from));
    const results = matching.slice(0, query.limit);
    const following = matching[query.limit];
    return {
      results,
      total: matching.length,
      limit: query.limit,
      from: results[0]?.uid ?? null,
      next: following?.uid ?? null,
    };
  }

  private schedule(): void {
    if (this.scheduled) return;
    this.scheduled = true;
    setImmediate(() => {
      this.scheduled = false;
      this.runNext();
    });
  }

  private runNext(): void {
    const task = this.queue[0];
    if (!task) return;
    const { view } = task;
    const started = performance.now();
    view.status = 'processing';
    view.startedAt = new Date().toISOString();
    view.batchUid = view.uid;
    try {
      const outcome = task.work();
      if (outcome) Object.assign(view.details, outcome);
      view.status = 'succeeded';
    } catch (error) {
      view.status = 'failed';
      view.error = toMeiliError(error).toBody();
    }
    view.finishedAt = new Date().toISOString();
    view.duration = isoDuration(performance.now() - started);
    this.queue.shift();
    if (this.queue.length > 0) this.schedule();
    else {
      const waiters = this.idleWaiters;
      this.idleWaiters = [];
      for (const resolve of waiters) resolve();
    }
  }
}
