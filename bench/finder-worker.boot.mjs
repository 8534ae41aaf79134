// Worker-thread entry: registers tsx inside the thread (Node 20 does not pass --import loaders
// to a worker's entry point), then loads the TypeScript thread module.
import { register } from "tsx/esm/api";

register();
await import("./finder-worker.thread.ts");
