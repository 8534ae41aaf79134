import type { ReactNode } from "react";

/**
 * A workspace panel that works on its own entries (load and pressure, trail angles): a card
 * named by its title for screen readers, the intro that says what to measure and what takes
 * precedence, then the panel's fields and figures.
 */
export function WorkspacePanel({
  titleId,
  title,
  intro,
  children,
}: {
  titleId: string;
  title: string;
  intro: string;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={titleId} className="flex flex-col gap-4 rounded-card bg-white p-4 shadow-card ring-1 ring-basalt-100 sm:p-5">
      <div>
        <h2 id={titleId} className="text-lg font-semibold">
          {title}
        </h2>
        <p className="text-sm text-basalt-700">{intro}</p>
      </div>
      {children}
    </section>
  );
}
