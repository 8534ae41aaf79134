import Link from "next/link";

/** A quote's number as the shop prints it (Q-1042), linked to the staff quote page. */
export function QuoteNumberLink({ id, number }: { id: string; number: number }) {
  return (
    <Link className="font-medium whitespace-nowrap text-ember-700 underline" href={`/shop/quotes/${id}`}>
      Q-{number}
    </Link>
  );
}
