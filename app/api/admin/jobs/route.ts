import { route } from "@/lib/platform/http/route";
import { jobQueries } from "@/lib/platform/jobs/queries";

/** Failed jobs and jobs waiting for a retry (queue, last error, attempts, times; never their data). */
export const GET = route({ access: ["admin"] }, async () => ({ jobs: await jobQueries.listProblemJobs() }));
