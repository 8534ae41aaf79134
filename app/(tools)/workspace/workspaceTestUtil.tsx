import { cleanup, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeEach } from "vitest";
import { DEFAULT_INPUT } from "@/lib/comparisons/schema";
import { Workspace } from "./Workspace";

/**
 * Workspace component tests start every test on a fresh /workspace: no display choice remembered
 * and nothing in the address, since the workspace reads both as it mounts.
 */
export function freshWorkspaceEachTest() {
  beforeEach(() => {
    window.localStorage.clear();
    window.history.replaceState(null, "", "/workspace");
  });
  afterEach(cleanup);
}

/** The figure a headline change shows (its `<dd>`), found by the change's test id. */
export const headline = (id: string) => screen.getByTestId(id).querySelector("dd")?.textContent;

/** The workspace on the default comparison, with a user to drive it. */
export function renderDefault() {
  const user = userEvent.setup();
  render(<Workspace initialInput={DEFAULT_INPUT} initialProblems={[]} />);
  return user;
}
