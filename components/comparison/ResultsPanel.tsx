// Read-only results of a comparison: the headline changes (HeadlineChanges.tsx) and the warnings
// (WarningList.tsx); the detail table is SetupDetailTable.tsx, all together WholeResults.tsx.
// Props are the computed result and the display choice, so the workspace, a share page and a
// garage page render the same thing. No hooks: it renders on the server too. Importers take both
// from here, as before the split.
export { HeadlineChanges } from "./HeadlineChanges";
export { WarningList } from "./WarningList";
