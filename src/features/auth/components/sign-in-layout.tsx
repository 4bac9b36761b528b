import type { ReactNode } from "react";
import { Wordmark } from "@/components/layout/logo-mark";

/** The frame around the signed-out pages: the product's name, one card, nothing else to get lost in. */
export function SignInLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-paper">
      <header className="px-4 pt-6 sm:px-8">
        <Wordmark />
      </header>
      <main id="main" tabIndex={-1} className="flex flex-1 items-start justify-center px-4 py-8 focus:outline-none sm:items-center sm:py-12">
        <div className="w-full max-w-xl rounded-card border border-line bg-surface p-6 shadow-card sm:p-10">{children}</div>
      </main>
    </div>
  );
}
