import { vi } from "vitest";

/**
 * Component tests' stand-in for next/navigation: one router whose moves are mocks to assert on.
 * Use as `vi.mock("next/navigation", () => import("@/tests/support/navigation"))`, and import
 * `router` from here; `vi.clearAllMocks()` in afterEach forgets the calls.
 */
export const router = { refresh: vi.fn(), push: vi.fn(), replace: vi.fn(), back: vi.fn() };
export const useRouter = () => router;
