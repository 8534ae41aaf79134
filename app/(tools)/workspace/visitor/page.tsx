import type { Metadata } from "next";
import { PageHeader } from "@/components/ui/PageHeader";
import { DEFAULT_INPUT } from "@/lib/comparisons/model";
import { SaveSlot } from "../SaveSlot";
import { Workspace } from "../Workspace";
import { WORKSPACE_LEAD, WORKSPACE_METADATA } from "../pageText";

/**
 * The workspace as a visitor opens it: the demo comparison, no garage, the sign-in prompt. The
 * same for everyone, so it is rendered once at build time (`force-static`; the header shows the
 * signed-out links, which is what a visitor has) and served as a file: proxy.ts sends a bare
 * /workspace without a session cookie here, the address bar keeping /workspace. Everything after
 * that is computed in the browser, as on the page rendered per request (../page.tsx), which
 * members and links carrying a comparison get.
 */
export const dynamic = "force-static";

export const metadata: Metadata = { ...WORKSPACE_METADATA, alternates: { canonical: "/workspace" } };

export default function VisitorWorkspacePage() {
  return (
    <>
      <PageHeader title="Comparison workspace" lead={WORKSPACE_LEAD} />
      <Workspace
        initialInput={DEFAULT_INPUT}
        initialProblems={[]}
        garage={null}
        savedId={null}
        saveSlot={<SaveSlot signedIn={false} saved={null} />}
      />
    </>
  );
}
