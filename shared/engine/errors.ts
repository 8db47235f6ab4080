/**
 * Raised by engine functions for arguments they cannot compute with
 * (temperature below absolute zero, unknown dopant, non-finite numbers...).
 * `path` names the offending field so callers can map it onto a form or an API issue.
 */
export class EngineInputError extends Error {
  constructor(
    message: string,
    public readonly path: string,
  ) {
    super(message);
    this.name = 'EngineInputError';
  }
}

/** Throws unless `value` is a finite number. Returns it for chaining. */
export function requireFinite(value: number, path: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new EngineInputError(`${path} must be a finite number (got ${String(value)})`, path);
  }
  return value;
}

/** Throws unless `value` is a finite number > 0. */
export function requirePositive(value: number, path: string): number {
  requireFinite(value, path);
  if (value <= 0) throw new EngineInputError(`${path} must be greater than 0 (got ${value})`, path);
  return value;
}

/** Throws unless `value` is a finite number >= 0. */
export function requireNonNegative(value: number, path: string): number {
  requireFinite(value, path);
  if (value < 0) throw new EngineInputError(`${path} must not be negative (got ${value})`, path);
  return value;
}
