/** What every route of one stand-in instance shares. */
import { IndexCatalog } from './index-catalog';
import { TaskRegistry } from './task-registry';

export interface StandinState {
  catalog: IndexCatalog;
  tasks: TaskRegistry;
}

export function createStandinState(): StandinState {
  return { catalog: new IndexCatalog(), tasks: new TaskRegistry() };
}
