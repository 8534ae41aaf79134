import type { Actor } from "@/lib/shop/quotes/queries";

/**
 * Who did it at the counter, as records name them: the signed-in person's name, or their e-mail
 * address when they have given no name.
 *
 * @example
 * counterActor({ userId: "u1", name: "", email: "sam@example.test" }); // { userId: "u1", label: "sam@example.test" }
 */
export const counterActor = (caller: { userId: string; name: string; email: string }): Actor & { userId: string } => ({
  userId: caller.userId,
  label: caller.name || caller.email,
});
