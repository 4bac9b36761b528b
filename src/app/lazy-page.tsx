import type { ComponentType } from "react";
import { ReloadPageButton } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

interface PageModule {
  Component: ComponentType;
}

/**
 * A route's `lazy` that never rejects. When a page's code cannot be downloaded (dropped
 * connection, or a new release replaced the files), React Router would otherwise keep treating
 * the route as still loading and leave the page area empty. Instead the page area says what
 * happened, while the header and navigation keep working. Browsers remember a failed module
 * download for the life of the page, so the way out is a reload, not a second import.
 */
export function lazyPage(load: () => Promise<PageModule>) {
  return async (): Promise<PageModule> => {
    try {
      return await load();
    } catch {
      return { Component: PageLoadFailed };
    }
  };
}

function PageLoadFailed() {
  return (
    <div className="mx-auto max-w-prose py-6">
      <Notice
        tone="danger"
        live="alert"
        title="This page could not be loaded"
        actions={
          <ReloadPageButton />
        }
      >
        <p>The connection may have dropped, or Linkleap has just been updated. Reload the page to try again; anything you have saved is kept.</p>
      </Notice>
    </div>
  );
}
