import { useEffect, useRef, useState, type RefObject } from "react";

/**
 * After a failed submit, moves focus to the first field marked invalid (or a form-level error
 * marked `data-form-error`), so keyboard and screen-reader users land on what needs fixing.
 * Call the returned function when a submit fails; focus moves once the errors have rendered.
 */
export function useFocusFirstError(containerRef: RefObject<HTMLElement | null>) {
  const [attempt, setAttempt] = useState(0);
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    const target = containerRef.current?.querySelector<HTMLElement>('[aria-invalid="true"], [data-form-error]');
    target?.focus();
  }, [attempt, containerRef]);
  return () => setAttempt((n) => n + 1);
}
