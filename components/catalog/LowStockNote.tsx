import { Badge } from "@/components/ui/Badge";

/** The dashboard's count of catalog items at or under their low-stock mark; nothing when none are. */
export function LowStockNote({ count }: { count: number }) {
  if (count === 0) return null;
  return (
    <span className="mt-1 flex items-center gap-2" data-testid="low-stock-count">
      <Badge tone="tight">Low stock</Badge>
      {count === 1 ? "1 item is at or under its low-stock mark." : `${count} items are at or under their low-stock mark.`}
    </span>
  );
}
