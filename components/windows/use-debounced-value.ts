// A value that follows its input only after typing pauses, so a search box does not query on every key.
import { useEffect, useState } from 'react';

/** Long enough to skip the keys of one word, short enough to feel live. */
export const SEARCH_DEBOUNCE_MS = 250;

export function useDebouncedValue<T>(value: T, delayMs = SEARCH_DEBOUNCE_MS): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
