/** The Hubface mark: a wheel's mounting face — hub bore, five studs, and the tread ring. */
export function LogoMark({ className = "size-8", title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 48 48"
      className={className}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
    >
      <circle cx="24" cy="24" r="22" fill="#181b21" />
      <circle cx="24" cy="24" r="15.5" fill="none" stroke="#e25b16" strokeWidth="3" />
      <circle cx="24" cy="24" r="5" fill="#fbf8f3" />
      {[0, 72, 144, 216, 288].map((a) => {
        const r = (a - 90) * (Math.PI / 180);
        return <circle key={a} cx={24 + 10 * Math.cos(r)} cy={24 + 10 * Math.sin(r)} r="2.1" fill="#fbf8f3" />;
      })}
    </svg>
  );
}
