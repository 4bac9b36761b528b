import { errorMessage } from "@/lib/api-client";
import { Button } from "./button";
import { ReloadIcon } from "./icons";
import { Notice } from "./notice";

interface ErrorStateProps {
  /** What could not be done, e.g. "Could not load your classes". */
  title: string;
  error: unknown;
  onRetry?: () => void;
  retrying?: boolean;
  className?: string;
}

/** A failed load: what failed, the server's explanation, and a way to try again. */
export function ErrorState({ title, error, onRetry, retrying = false, className }: ErrorStateProps) {
  return (
    <Notice
      tone="danger"
      live="alert"
      title={title}
      className={className}
      actions={
        onRetry ? (
          <Button onClick={onRetry} busy={retrying} icon={<ReloadIcon />}>
            Try again
          </Button>
        ) : null
      }
    >
      <p>{errorMessage(error)}</p>
    </Notice>
  );
}
