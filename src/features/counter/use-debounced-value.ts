import { useCallback, useEffect, useState } from 'react';

/**
 * `value` after it has been still for `delayMs`, and `flush()` to take it at once: the search
 * follows typing at a calm pace, and Enter (or a barcode scanner's Enter) does not wait.
 */
export function useDebouncedValue<T>(value: T, delayMs: number): [T, () => void] {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  const flush = useCallback(() => setSettled(value), [value]);
  return [settled, flush];
}
