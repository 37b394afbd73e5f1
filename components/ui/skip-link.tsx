/**
 * First thing in <body>: lets keyboard users jump past navigation to <main id="main">.
 * Hidden until focused, then shown as a plain, large link.
 */
export function SkipLink({ href = "#main", children = "Skip to content" }: { href?: string; children?: string }) {
  return (
    <a
      href={href}
      data-skip-link=""
      className="sr-only focus:not-sr-only focus:fixed focus:left-3 focus:top-3 focus:z-50 focus:inline-flex focus:min-h-tap focus:items-center focus:rounded-md focus:bg-card focus:px-4 focus:font-medium focus:text-ink focus:shadow-raised"
    >
      {children}
    </a>
  );
}
