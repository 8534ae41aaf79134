import { route } from "@/lib/platform/http/route";

export const GET = route({ access: "signed-in" }, async ({ caller }) => ({
  id: caller.userId,
  name: caller.name,
  email: caller.email,
  role: caller.role,
  shopId: caller.shopId,
}));
