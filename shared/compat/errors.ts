/**
 * Thrown when the model is handed a number it cannot work with (not finite, or out of the range
 * the physics holds in). The API validates with zod first; this is the second line, so a bad
 * value never turns into a NaN verdict.
 */
export class CompatInputError extends Error {
  override readonly name = 'CompatInputError';

  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
  }
}

export function requireFinite(value: number, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CompatInputError(field, `must be a finite number, got ${String(value)}`);
  }
  return value;
}

export function requirePositive(value: number, field: string): number {
  requireFinite(value, field);
  if (value <= 0) throw new CompatInputError(field, `must be positive, got ${value}`);
  return value;
}

/** Walks a plain settings-like object and requires every number in it to be finite. */
export function requireFiniteDeep(value: unknown, field: string): void {
  if (typeof value === 'number') {
    requireFinite(value, field);
  } else if (value !== null && typeof value === 'object') {
    for (const [key, inner] of Object.entries(value)) requireFiniteDeep(inner, `${field}.${key}`);
  }
}
