import path from 'node:path';
import { Router } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { AppError } from '../errors';

const YEAR_IMMUTABLE = 'public, max-age=31536000, immutable';

/**
 * The built client: each file sent as the brotli or gzip copy the build wrote beside it (by what the
 * browser accepts), hashed assets cached for a year, never a source map, and the app shell for every
 * other GET (the browser's routes).
 */
export function clientFiles(dir: string): Router {
  const assets = path.join(dir, 'assets') + path.sep;
  const router = Router();
  // Source maps would publish the source: none is sent, even if a build leaves one behind.
  router.use((req, _res, next) => next(req.path.endsWith('.map') ? AppError.notFound('That file') : undefined));
  router.use(
    expressStaticGzip(dir, {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: {
        maxAge: '1h',
        // A file under assets/ has its content's hash in its name: a new build gives a new name.
        setHeaders: (res, filePath) => {
          if (filePath.startsWith(assets)) res.setHeader('Cache-Control', YEAR_IMMUTABLE);
        },
      },
    }),
  );
  // A missing asset is a 404, not the app shell under a script's name.
  router.use('/assets', (req, _res, next) => next(AppError.notFound(`The file ${req.path}`)));
  router.get('/{*page}', (_req, res) => {
    // Revalidated each time, so a new release's chunk names reach the browser at once.
    res.setHeader('Cache-Control', 'no-cache');
    // dotfiles: the test build lives under .data/, and this path is ours, not the client's.
    res.sendFile(path.join(dir, 'index.html'), { dotfiles: 'allow' });
  });
  return router;
}
