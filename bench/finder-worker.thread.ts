/** Worker-thread side of bench/finder-worker.bench.ts: the same job function the Web Worker runs. */
import { parentPort } from "node:worker_threads";
import { type FinderJob, runFinderJob } from "../lib/garage/finderJob";

parentPort?.on("message", (job: FinderJob) => runFinderJob(job, (reply) => parentPort?.postMessage(reply)));
