/** The first stop for keyboard users: jump past the header to the page itself. */
export function SkipLink({ targetId = "main" }: { targetId?: string }) {
  return (
    <a
      href={`#${targetId}`}
      className="sr-only focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:inline-flex focus:min-h-touch focus:items-center focus:rounded-control focus:bg-ink focus:px-4 focus:font-bold focus:text-paper"
    >
      Skip to main content
    </a>
  );
}
