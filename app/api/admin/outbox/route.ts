import { route } from "@/lib/platform/http/route";
import { fetchOutbox } from "@/lib/platform/mail/outbox";

export const GET = route({ access: ["admin"] }, async () => ({ messages: await fetchOutbox() }));
