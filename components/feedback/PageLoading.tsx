/**
 * A route segment's loading state, shown while the page streams. It takes the viewport's whole
 * height so that the footer starts below the fold: a short spinner let the footer sit at the
 * bottom of the screen and then jump away when the page arrived, a layout shift of about 0.15
 * on a phone (Lighthouse, /workspace with a comparison in the link and the vehicle page). The
 * page replacing it is new content, which does not count as a shift.
 */
export function PageLoading({ label = "Loading" }: { label?: string }) {
  return (
    <div
      role="status"
      aria-live="polite"
      className="flex min-h-[100svh] items-start gap-3 py-16 text-basalt-500"
      data-testid="page-loading"
    >
      <span aria-hidden className="size-5 animate-spin rounded-full border-2 border-ember-500 border-t-transparent" />
      {label}…
    </div>
  );
}
