import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { decodeComparison } from "@/lib/comparison/url";
import { Workspace } from "./Workspace";

export const metadata: Metadata = {
  title: "Comparison workspace",
  description: "Your current wheel and tire setup beside the one you plan: diameter, clearance, poke, scrub, track, speedometer and engine speed, with a to-scale drawing.",
};

export default async function WorkspacePage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { input, problems } = decodeComparison(await searchParams);
  return (
    <>
      <PageHeader
        title="Comparison workspace"
        lead="Enter what you run and what you plan. Every figure updates as you type, in your browser; the link in the address bar reproduces this comparison."
      />
      <Workspace initialInput={input} initialProblems={problems} />
    </>
  );
}
