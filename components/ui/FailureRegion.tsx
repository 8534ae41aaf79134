import { Alert } from "./Alert";

/**
 * Where a form or flow announces that it failed: the assertive live region is always in the page,
 * so a message that appears in it is read out at once; empty, it shows nothing.
 * @example <FailureRegion message={failure} title="Nothing was imported" />
 */
export function FailureRegion({
  message,
  title,
  className,
  alertClassName,
}: {
  message: string | null;
  title?: string;
  /** On the region, there even while it is empty (e.g. its grid column). */
  className?: string;
  /** On the message only (e.g. its margin, so an empty region takes no room). */
  alertClassName?: string;
}) {
  return (
    <div aria-live="assertive" className={className}>
      {message && (
        <Alert tone="error" title={title} className={alertClassName}>
          {message}
        </Alert>
      )}
    </div>
  );
}
