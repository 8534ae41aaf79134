export function SiteFooter() {
  return (
    <footer className="no-print border-t border-basalt-200 py-6 text-center text-xs text-basalt-500">
      <p className="mx-auto max-w-3xl px-4">
        Hubface computes fitment from the sizes you enter. Figures are estimates: measure the vehicle, and follow the vehicle, wheel and
        tire makers&apos; instructions, local regulations and a licensed shop&apos;s practice for lifting, steering, bead seating and
        torque.
      </p>
    </footer>
  );
}
