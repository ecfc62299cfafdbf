/**
 * Meilisearch's task queue: a write answers 202 with an enqueued task at once and is applied
 * afterwards, one task at a time in arrival order; the SDK polls `GET /tasks/:uid` until it is done.
 */
import { toMeiliError, type MeiliErrorBody } from './meili-error';

export type TaskType = 'indexCreation' | 'indexDeletion' | 'indexSwap' | 'documentAdditionOrUpdate' | 'documentDeletion' | 'settingsUpdate';

export interface Task {
  uid: number;
  indexUid: string | null;
  status: 'enqueued' | 'processing' | 'succeeded' | 'failed';
  type: TaskType;
  details: Record<string, unknown>;
  error: MeiliErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

const NOT_STARTED = { duration: null, startedAt: null, finishedAt: null };

/** Finished tasks kept for polling; older ones are forgotten, as a long-running process must. */
const KEEP = 10_000;

export class TaskQueue {
  private readonly tasks = new Map<number, Task>();
  private nextUid = 0;
  private tail: Promise<void> = Promise.resolve();

  /** Enqueues `work`; what it returns is merged into the task's details. */
  enqueue(indexUid: string | null, type: TaskType, details: Record<string, unknown>, work: () => unknown): Record<string, unknown> {
    const uid = this.nextUid++;
    const enqueuedAt = new Date().toISOString();
    const task: Task = { uid, indexUid, type, details, status: 'enqueued', error: null, enqueuedAt, ...NOT_STARTED };
    this.tasks.set(uid, task);
    this.tasks.delete(uid - KEEP);
    this.tail = this.tail.then(() => this.run(task, work));
    return { taskUid: uid, indexUid, status: 'enqueued', type, enqueuedAt };
  }

  private async run(task: Task, work: () => unknown): Promise<void> {
    // A later turn, so the 202 goes out before the work starts.
    await new Promise((resolve) => setImmediate(resolve));
    const started = performance.now();
    task.status = 'processing';
    task.startedAt = new Date().toISOString();
    try {
      Object.assign(task.details, await work());
      task.status = 'succeeded';
    } catch (error) {
      task.status = 'failed';
      task.error = toMeiliError(error).toBody();
    }
    task.duration = `PT${((performance.now() - started) / 1000).toFixed(3)}S`;
    task.finishedAt = new Date().toISOString();
  }

  get(uid: number): Task | undefined {
    return this.tasks.get(uid);
  }
}
