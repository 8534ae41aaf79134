import type { InputHTMLAttributes, Ref } from "react";
import { cx } from "./cx";
import { FieldFrame } from "./FieldFrame";

interface Props extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  name: string;
  error?: string;
  hint?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled input whose hint and error are tied to it for screen readers. */
export function TextField({ label, name, error, hint, id, className, ref, ...rest }: Props) {
  return (
    <FieldFrame label={label} name={name} id={id} hint={hint} error={error} className={className}>
      {(control) => <input {...control} name={name} ref={ref} className={cx(control.className, "placeholder:text-basalt-500")} {...rest} />}
    </FieldFrame>
  );
}
