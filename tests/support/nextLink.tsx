/**
 * Component tests' stand-in for next/link: a plain anchor, so a component renders without Next's
 * router. Use as `vi.mock("next/link", () => import("@/tests/support/nextLink"))`.
 */
import type { ReactNode } from "react";

export default function Link({ href, children, ...rest }: { href: string; children: ReactNode }) {
  return (
    <a href={href} {...rest}>
      {children}
    </a>
  );
}
