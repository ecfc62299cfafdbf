import { randomUUID } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PassThrough } from 'node:stream';
import { finished } from 'node:stream/promises';
import type multer from 'multer';
import { countDataLines } from './count-rows';
import { PriceListFileError } from './parse';

/**
 * multer storage: the upload onto disk, as multer's disk storage does, and through the row count
 * on its way there. A file over the row limit is refused while it is still arriving: the count
 * stops the upload, the part written is deleted, and multer answers once the client has sent the
 * rest (it drains the request, so the client sees the refusal and not a broken connection).
 */
export function countingDiskStorage(opts: { maxFileBytes: number; maxDataRows?: number }): multer.StorageEngine {
  return {
    _handleFile(_req, file, cb) {
      const filePath = path.join(tmpdir(), `arcwise-price-list-${randomUUID()}`);
      const disk = createWriteStream(filePath);
      const tee = new PassThrough();
      let size = 0;
      file.stream.on('data', (chunk: Buffer) => {
        size += chunk.length;
      });
      file.stream.pipe(disk);
      file.stream.pipe(tee);
      const counting = countDataLines(tee, opts).then(
        () => null,
        (err: unknown) => {
          // Anything but the row limit is the parser's to report, with its line and reason: keep the bytes flowing.
          tee.resume();
          if (err instanceof PriceListFileError && err.code === 'too-many-rows') {
            file.stream.unpipe(disk);
            file.stream.unpipe(tee);
            file.stream.resume();
            disk.destroy();
            return err;
          }
          return null;
        },
      );
      Promise.all([
        counting,
        finished(disk).then(
          () => null,
          (err: unknown) => err,
        ),
      ])
        .then(async ([refusal, diskError]) => {
          if (refusal) {
            await rm(filePath, { force: true });
            return cb(refusal);
          }
          if (diskError) return cb(diskError);
          cb(null, { destination: tmpdir(), filename: path.basename(filePath), path: filePath, size });
        })
        .catch((err: unknown) => cb(err));
    },
    _removeFile(_req, file, cb) {
      rm(file.path, { force: true }).then(
        () => cb(null),
        (err: unknown) => cb(err as Error),
      );
    },
  };
}
