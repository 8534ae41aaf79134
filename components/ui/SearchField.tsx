import { cx } from "./cx";

/**
 * A search box with its label above it, for lists filtered as the reader types (or on Find): the
 * label wraps the input, so the box is named by it. `className` sizes the label and box together,
 * `inputClassName` the box alone.
 *
 * @example <SearchField label="Filter by tire size" value={filter} onValue={setFilter} placeholder="e.g. 35x" />
 */
export function SearchField({
  label,
  value,
  onValue,
  placeholder,
  maxLength,
  className,
  inputClassName,
}: {
  label: string;
  value: string;
  onValue: (value: string) => void;
  placeholder?: string;
  maxLength?: number;
  className?: string;
  inputClassName?: string;
}) {
  return (
    <label className={cx("flex flex-col gap-1 text-sm font-medium", className)}>
      {label}
      <input
        type="search"
        maxLength={maxLength}
        placeholder={placeholder}
        className={cx("rounded-lg border border-basalt-300 px-3", inputClassName)}
        value={value}
        onChange={(e) => onValue(e.target.value)}
      />
    </label>
  );
}
