import { route } from "@/lib/http/route";
import { fetchOutbox } from "@/lib/mail/outbox";

export const GET = route({ access: ["admin"] }, async () => ({ messages: await fetchOutbox() }));
