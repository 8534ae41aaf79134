/** Shown before a row's control on a phone, where the table's header row is not. */
export function PhoneLabel({ children }: { children: string }) {
  return (
    <span aria-hidden className="mr-2 inline-block w-12 text-xs font-semibold uppercase tracking-wide text-basalt-500 md:hidden">
      {children}
    </span>
  );
}
