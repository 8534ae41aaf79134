import { LogoMark } from "./LogoMark";

/** The mark with the name beside it, as the site header shows it. */
export function Logo() {
  return (
    <span className="inline-flex items-center gap-2">
      <LogoMark />
      <span className="font-display text-xl font-bold tracking-tight text-basalt-900">Hubface</span>
    </span>
  );
}
