import Link from "next/link";
import type { ComponentProps } from "react";
import { buttonClass } from "./Button";

/**
 * A link that looks like a Button (a page's "New …" or "Back to …" action): next/link with the
 * button's classes, so a page names the destination and the words only.
 * @example <LinkButton href="/garage/new">Add a vehicle</LinkButton>
 */
export function LinkButton({
  variant = "primary",
  className,
  ...rest
}: ComponentProps<typeof Link> & { variant?: Parameters<typeof buttonClass>[0] }) {
  return <Link className={buttonClass(variant, className)} {...rest} />;
}
