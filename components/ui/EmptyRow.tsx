import type { ReactNode } from "react";

/**
 * A table body's one full-width row saying there is nothing to list (best with what to do about
 * it); each table gives its own padding and colour.
 */
export function EmptyRow({ colSpan, className, children }: { colSpan: number; className?: string; children: ReactNode }) {
  return (
    <tr>
      <td colSpan={colSpan} className={className}>
        {children}
      </td>
    </tr>
  );
}
