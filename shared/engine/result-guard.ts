// Last line of defence: a result never leaves the engine holding NaN or Infinity.

/** Raised when the engine itself produced a non-finite number; `path` names the result field. */
export class EngineResultError extends Error {
  constructor(
    message: string,
    public readonly path: string,
  ) {
    super(message);
    this.name = 'EngineResultError';
  }
}

/** Path of the first non-finite number inside value, or null; the path is built only on the way out. */
function findNonFinite(value: unknown): (string | number)[] | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : [];
  if (value === null || typeof value !== 'object') return null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const v: unknown = value[i];
      if (typeof v === 'number') {
        if (!Number.isFinite(v)) return [i];
      } else if (v !== null && typeof v === 'object') {
        const inner = findNonFinite(v);
        if (inner) return [i, ...inner];
      }
    }
    return null;
  }
  for (const k in value) {
    const inner = findNonFinite((value as Record<string, unknown>)[k]);
    if (inner) return [k, ...inner];
  }
  return null;
}

/** Walks a plain-data result and throws EngineResultError naming the first non-finite field. */
export function assertFiniteResult(value: unknown): void {
  const at = findNonFinite(value);
  if (!at) return;
  const path = at.join('.');
  throw new EngineResultError(`Internal error: result field ${path || '(root)'} is not a finite number`, path);
}
