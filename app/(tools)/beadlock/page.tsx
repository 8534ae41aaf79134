import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { RingHelper } from "./RingHelper";

export const metadata: Metadata = {
  title: "Beadlock ring helper",
  description:
    "The crisscross order of a beadlock ring's bolts as a numbered diagram, the torque passes from the ring maker's figure in ft·lb and N·m, a bolt-by-bolt tick-off and a one-page sheet to print.",
};

export default function BeadlockPage() {
  return (
    <>
      <PageHeader
        title="Beadlock ring helper"
        // The sheet carries its own summary line; the lead would only push it onto a second page.
        lead={
          <span className="print:hidden">
            How many bolts hold the ring, and what the ring maker says to torque them to: the order to follow, the passes to make, and a
            tick-off as you go.
          </span>
        }
      />
      <RingHelper />
    </>
  );
}
