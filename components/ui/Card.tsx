import type { HTMLAttributes } from "react";
import { cx } from "./cx";

export function Card({ className, ...rest }: HTMLAttributes<HTMLDivElement>) {
  return <div className={cx("rounded-card bg-white p-5 shadow-card ring-1 ring-basalt-100", className)} {...rest} />;
}
