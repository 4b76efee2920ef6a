/** Freezes a plain record and everything inside it, so results cannot be edited after analysis. */
export function deepFreeze<T>(value: T): T {
  if (value === null || typeof value !== 'object' || Object.isFrozen(value)) return value;
  Object.freeze(value);
  if (Array.isArray(value)) {
    for (const v of value) if (v !== null && typeof v === 'object') deepFreeze(v);
  } else {
    const rec = value as Record<string, unknown>;
    for (const k in rec) {
      const v = rec[k];
      if (v !== null && typeof v === 'object') deepFreeze(v);
    }
  }
  return value;
}
