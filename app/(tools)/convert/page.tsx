import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { Converter } from "./Converter";

export const metadata: Metadata = {
  title: "Converter",
  description:
    "Tire sizes inch ⇄ metric with the nearest standard equivalents, lengths mm ⇄ in with fractions, pressure psi ⇄ kPa ⇄ bar, torque ft·lb ⇄ N·m.",
};

export default function ConvertPage() {
  return (
    <>
      <PageHeader
        title="Converter"
        lead="Tire sizes between inch and metric designations, and the lengths, pressures and torques of the trade. Everything converts in your browser as you type."
      />
      <Converter />
    </>
  );
}
