"use client";
import QueryLayout from "@/app/QueryLayout";
import type { OpenedComparison } from "./currentInput";
import { SaveComparison } from "./SaveComparison";

/** The members' save control with the query client it writes through, loaded only for members (SaveSlot). */
export function SaveComparisonWithQuery({ saved }: { saved: OpenedComparison | null }) {
  return (
    <QueryLayout>
      <SaveComparison saved={saved} />
    </QueryLayout>
  );
}
