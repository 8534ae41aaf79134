import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { RingHelper } from "./RingHelper";

export const metadata: Metadata = {
  title: "Beadlock ring helper",
  description: "The crisscross order of a beadlock ring's bolts as a numbered diagram, with the torque passes from the ring maker's figure in ft·lb and N·m.",
};

export default function BeadlockPage() {
  return (
    <>
      <PageHeader title="Beadlock ring helper" lead="How many bolts hold the ring, and what the ring maker says to torque them to: the order to follow and the passes to make." />
      <RingHelper />
    </>
  );
}
