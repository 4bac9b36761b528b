import { useEffect } from "react";

/** Names the browser tab after the page, so people and screen readers know where they are. */
export function useDocumentTitle(title: string | undefined) {
  useEffect(() => {
    document.title = title ? `${title} · Linkleap` : "Linkleap";
  }, [title]);
}
