import { useEffect, useState } from "react";

/**
 * The value as it was `delayMs` after it last changed, so typing does not send a request per
 * key. Values are compared by their JSON, so a fresh object with the same content is no change.
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const key = JSON.stringify(value) as string | undefined;
  const [debounced, setDebounced] = useState<{ key: string | undefined; value: T }>({ key, value });
  useEffect(() => {
    if (key === debounced.key) return;
    const timer = setTimeout(() => setDebounced({ key, value: (key === undefined ? undefined : JSON.parse(key)) as T }), delayMs);
    return () => clearTimeout(timer);
  }, [key, debounced.key, delayMs]);
  return debounced.value;
}
