import Link from "next/link";
import type { ReactNode } from "react";
import { Button, buttonClass } from "./Button";

/** Either buttons that call `onPage` (a list paged in the browser's state) or links from `hrefFor` (a list paged in the address). */
type Turn = { onPage: (pageIndex: number) => void; hrefFor?: never } | { hrefFor: (pageIndex: number) => string; onPage?: never };

const STEP = "min-h-8 py-1";

/**
 * Previous / "Page n of m" / Next under a paged list. The page line is announced when it changes,
 * so a screen reader hears where a click went.
 *
 * @example
 * <Pagination label="Catalog pages" pageIndex={0} pageCount={4} onPage={setPage} />
 * <Pagination label="Pages of quotes" pageIndex={1} pageCount={9} hrefFor={(i) => `/shop/quotes?page=${i + 1}`} />
 */
export function Pagination({ label, pageIndex, pageCount, ...turn }: { label: string; pageIndex: number; pageCount: number } & Turn) {
  const last = Math.max(pageCount, 1) - 1;
  const step = (to: number, disabled: boolean, text: ReactNode) => {
    if (!turn.hrefFor) {
      return (
        <Button variant="secondary" className={STEP} onClick={() => turn.onPage(to)} disabled={disabled}>
          {text}
        </Button>
      );
    }
    // A link with nowhere to go is no link: shown dimmed, as the disabled button is.
    if (disabled) return <span className={buttonClass("secondary", `${STEP} text-basalt-500`)}>{text}</span>;
    return (
      <Link href={turn.hrefFor(to)} className={buttonClass("secondary", STEP)}>
        {text}
      </Link>
    );
  };
  return (
    <nav aria-label={label} className="flex flex-wrap items-center gap-2 text-sm">
      {step(pageIndex - 1, pageIndex <= 0, "Previous")}
      <span aria-live="polite">
        Page {Math.min(pageIndex, last) + 1} of {last + 1}
      </span>
      {step(pageIndex + 1, pageIndex >= last, "Next")}
    </nav>
  );
}
