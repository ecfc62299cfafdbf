/** Task polling: one task by uid, and the filtered list. */
import { Router } from 'express';
import { badRequest, MeiliError } from '../meili-error';
import { queryBoolean, queryInteger, queryList, queryString } from '../request-values';
import type { StandinState } from '../standin-state';

function uidList(value: unknown): number[] | undefined {
  const list = queryList(value);
  if (!list || list.includes('*')) return undefined;
  return list.map((item) => {
    const uid = Number(item);
    if (!Number.isInteger(uid) || uid < 0)
      throw badRequest('invalid_task_uids', `Invalid value in parameter \`uids\`: could not parse \`${item}\` as a positive integer.`);
    return uid;
  });
}

function starList(value: unknown): string[] | undefined {
  const list = queryList(value);
  return !list || list.includes('*') ? undefined : list;
}

export function tasksRoutes({ tasks }: StandinState): Router {
  const router = Router();

  router.get('/tasks/:uid', (req, res) => {
    const text = String(req.params.uid);
    const uid = Number(text);
    if (!Number.isInteger(uid) || uid < 0)
      throw badRequest('invalid_task_uids', `Invalid value in parameter \`taskUid\`: could not parse \`${text}\` as a positive integer.`);
    const task = tasks.get(uid);
    if (!task) throw new MeiliError(404, 'task_not_found', `Task \`${uid}\` not found.`);
    res.json(task);
  });

  router.get('/tasks', (req, res) => {
    const from = queryString(req.query.from);
    res.json(
      tasks.list({
        uids: uidList(req.query.uids),
        statuses: starList(req.query.statuses),
        types: starList(req.query.types),
        indexUids: starList(req.query.indexUids),
        limit: queryInteger(req.query.limit, 'taskLimit', 20),
        from: from === undefined ? undefined : queryInteger(from, 'taskFrom', 0),
        reverse: queryBoolean(req.query.reverse) ?? false,
      }),
    );
  });

  return router;
}
