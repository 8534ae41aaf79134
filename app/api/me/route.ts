import { meDto } from "@/lib/accounts/api";
import { route } from "@/lib/platform/http/route";

export const GET = route({ access: "signed-in" }, async ({ caller }) => meDto(caller));
