import { useRef } from 'react';

/**
 * The same object for as long as its JSON stays the same, so a request rebuilt on every render does
 * not restart a debounce or a query.
 */
export function useStableValue<T>(value: T): T {
  const ref = useRef<{ json: string; value: T } | null>(null);
  const json = JSON.stringify(value);
  if (ref.current === null || ref.current.json !== json) ref.current = { json, value };
  return ref.current.value;
}
