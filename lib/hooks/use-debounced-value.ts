import { useEffect, useState } from 'react';

/** The value, once it has stopped changing for `ms` milliseconds (search as you type). */
export function useDebouncedValue<T>(value: T, ms = 200): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}
