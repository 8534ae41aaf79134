import { route } from "@/lib/http/route";
import { jobQueries } from "@/lib/server/jobs";

/** Failed jobs and jobs waiting for a retry (queue, last error, attempts, times; never their data). */
export const GET = route({ access: ["admin"] }, async () => ({ jobs: await jobQueries.listProblemJobs() }));
