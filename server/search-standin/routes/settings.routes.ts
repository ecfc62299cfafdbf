/** Settings: the whole object (GET, PATCH, DELETE) and one key at a time (`/settings/<kebab-name>`). */
import { Router, type Request, type Response } from 'express';
import type { JsonObject } from '../field-paths';
import { assertValidIndexUid } from '../index-catalog';
import { settingsKeyFromRouteName, validateSettingsPatch } from '../index-settings';
import { MeiliError } from '../meili-error';
import type { StandinState } from '../standin-state';

export function settingsRoutes({ catalog, tasks }: StandinState): Router {
  const router = Router();

  const enqueuePatch = (uid: string, patch: JsonObject) =>
    tasks.enqueue(uid, 'settingsUpdate', { ...patch }, () => {
      // A settings update creates a missing index, as in Meilisearch.
      catalog.getOrCreate(uid).updateSettings(patch);
    });

  router.get('/indexes/:uid/settings', (req, res) => {
    res.json(catalog.get(assertValidIndexUid(req.params.uid)).settings);
  });

  router.patch('/indexes/:uid/settings', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    res.status(202).json(enqueuePatch(uid, validateSettingsPatch(req.body)));
  });

  router.delete('/indexes/:uid/settings', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    res.status(202).json(
      tasks.enqueue(uid, 'settingsUpdate', {}, () => {
        catalog.get(uid).resetSettings();
      }),
    );
  });

  const settingKey = (req: Request): string => {
    const name = String(req.params.name);
    const key = settingsKeyFromRouteName(name);
    if (!key) throw new MeiliError(404, 'not_found', `Unknown setting \`${name}\`.`);
    return key;
  };

  router.get('/indexes/:uid/settings/:name', (req, res) => {
    const key = settingKey(req);
    res.json(catalog.get(assertValidIndexUid(req.params.uid)).settings[key] ?? null);
  });

  const replaceOne = (req: Request, res: Response) => {
    const uid = assertValidIndexUid(req.params.uid);
    const key = settingKey(req);
    const value: unknown = req.body ?? null;
    res.status(202).json(enqueuePatch(uid, validateSettingsPatch({ [key]: value })));
  };
  router.put('/indexes/:uid/settings/:name', replaceOne);
  router.patch('/indexes/:uid/settings/:name', replaceOne);

  router.delete('/indexes/:uid/settings/:name', (req, res) => {
    const uid = assertValidIndexUid(req.params.uid);
    res.status(202).json(enqueuePatch(uid, { [settingKey(req)]: null }));
  });

  return router;
}
