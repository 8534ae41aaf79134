import { cx } from "./cx";

/** A bulleted list of short texts (each text is its own key, so the texts are distinct). */
export function BulletList({ items, className }: { items: readonly string[]; className?: string }) {
  return (
    <ul className={cx("list-disc pl-5", className)}>
      {items.map((i) => (
        <li key={i}>{i}</li>
      ))}
    </ul>
  );
}
