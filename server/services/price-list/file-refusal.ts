import type { PriceListFileRefusalDetails } from '../../../shared/schemas/price-lists';
import { AppError } from '../../errors';
import { PriceListFileError, type PriceListFileErrorCode } from './decode';

/** 413 for size, 415 for what is not a text file, 400 for a text file that cannot be a price list. */
function statusOf(code: PriceListFileErrorCode): 400 | 413 | 415 {
  if (code === 'too-large') return 413;
  if (code === 'binary') return 415;
  return 400;
}

/** A whole-file refusal as the API reports it: `details.reason` is the parser's code, for the client to act on. */
export function fileRefusal(err: PriceListFileError, maxFileBytes: number): AppError {
  const status = statusOf(err.code);
  const details: PriceListFileRefusalDetails = { reason: err.code, ...err.details };
  if (err.code === 'too-large') details.limitMb = Math.round((maxFileBytes / 1024 / 1024) * 10) / 10;
  return new AppError(
    status,
    status === 413 ? 'payload_too_large' : status === 415 ? 'unsupported_file' : 'bad_request',
    err.message,
    details,
  );
}

export function tooLarge(maxFileBytes: number): AppError {
  const mb = Math.round((maxFileBytes / 1024 / 1024) * 10) / 10;
  return fileRefusal(new PriceListFileError('too-large', `The file is larger than the limit of ${mb} MB (set in Settings).`), maxFileBytes);
}

/** Rethrows a parser refusal as its AppError; anything else unchanged. */
export function asAppError(err: unknown, maxFileBytes: number): unknown {
  return err instanceof PriceListFileError ? fileRefusal(err, maxFileBytes) : err;
}
