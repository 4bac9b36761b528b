import { useEffect, useState } from "react";

/** `value`, once it has stopped changing for `delayMs` (compared by JSON, so a new object with the same content does not restart the wait). */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
    // The key stands for the value.
  }, [key, delayMs]);
  return settled;
}
