// Module hook for the production server (scripts/serve.ts): "server-only" throws unless loaded
// under React's server condition, which Next's bundle sets and plain Node does not. The job
// workers run app modules (mail, quotes) in the server process itself, so the marker resolves
// to an empty module here, as Next's server bundle does.
export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: "data:text/javascript,export {};", shortCircuit: true };
  return next(specifier, context);
}
