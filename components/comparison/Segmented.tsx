import { cx } from "@/components/ui/cx";

/** A small group of radio buttons shown as joined pills; arrow keys move between them. */
export function Segmented<T extends string>({
  legend,
  name,
  value,
  options,
  onChange,
  className,
  hideLegend = false,
}: {
  legend: string;
  name: string;
  value: T;
  options: { value: T; label: string }[];
  onChange: (value: T) => void;
  className?: string;
  hideLegend?: boolean;
}) {
  return (
    <fieldset className={cx("min-w-0", className)}>
      <legend className={cx("mb-1 text-sm font-medium text-basalt-800", hideLegend && "sr-only")}>{legend}</legend>
      <div className="inline-flex rounded-lg bg-basalt-100 p-0.5">
        {options.map((o) => (
          <label
            key={o.value}
            className={cx(
              "relative cursor-pointer rounded-md px-3 py-1.5 text-sm font-semibold has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-1 has-[:focus-visible]:outline-ember-500",
              value === o.value ? "bg-white text-basalt-950 shadow-sm" : "text-basalt-600 hover:text-basalt-900",
            )}
          >
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="sr-only"
            />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
