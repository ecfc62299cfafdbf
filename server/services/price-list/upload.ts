import type { Request, Response } from 'express';
import multer from 'multer';
import type { DataSource } from 'typeorm';
import { PRICE_LIST_MAX_FILE_NAME, PRICE_LIST_UPLOAD_FIELD } from '../../../shared/schemas/price-lists';
import { AppError } from '../../errors';
import { intakeSettings, type IntakeSettings } from '../settings.service';
import { countingDiskStorage } from './counting-storage';
import { fileRefusal, tooLarge } from './file-refusal';
import { PriceListFileError } from './parse';

/**
 * Receives the multipart upload onto disk (not memory: a 50 MB file and the parse of it would
 * otherwise sit in the heap together), with the size limit from Settings, counting its rows on
 * the way so a file over the row limit is refused as it arrives. The caller deletes
 * req.file.path when done, and reads the file under the settings answered.
 */
export async function receivePriceListUpload(req: Request, res: Response, ds: DataSource): Promise<IntakeSettings> {
  const settings = await intakeSettings(ds);
  await receive(req, res, settings.maxFileBytes);
  return settings;
}

function receive(req: Request, res: Response, maxFileBytes: number): Promise<void> {
  const upload = multer({
    storage: countingDiskStorage({ maxFileBytes }),
    limits: { fileSize: maxFileBytes, files: 1, fields: 10, fieldSize: 512 * 1024, parts: 12 },
    // Browsers send UTF-8 file names; busboy's default would read them as Latin-1.
    defParamCharset: 'utf8',
  }).single(PRICE_LIST_UPLOAD_FIELD);
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (err === undefined || err === null) return resolve();
      if (err instanceof PriceListFileError) return reject(fileRefusal(err, maxFileBytes));
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return reject(tooLarge(maxFileBytes));
        return reject(
          AppError.badRequest(`${err.field ?? 'upload'}: ${err.message}`, [{ field: err.field ?? 'file', message: err.message }]),
        );
      }
      // A failing disk is ours to log (500); anything else from the form parser is a broken upload.
      if (typeof err === 'object' && 'syscall' in err) return reject(err);
      reject(AppError.badRequest('The upload was cut off or is not valid multipart form data; try again.'));
    });
  });
}

/** The client's file name, as shown in the history: no folders, printable, bounded. */
export function cleanFileName(name: string): string {
  // eslint-disable-next-line no-control-regex
  const base = (name.split(/[\\/]/).pop() ?? '').replace(/[\u0000-\u001f\u007f]/g, '').trim();
  return (base || 'price-list.csv').slice(0, PRICE_LIST_MAX_FILE_NAME);
}
