/// <reference lib="webworker" />
/** The fitment search off the main thread: typing never waits for it. */
import { type FinderJob, runFinderJob } from "@/lib/garage/finderJob";

const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = (e: MessageEvent<FinderJob>) => runFinderJob(e.data, (reply) => scope.postMessage(reply));
