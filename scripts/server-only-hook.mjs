// Lets plain Node (the worker, scripts) load server code: "server-only" only
// guards against client bundles, which do not exist outside Next.
import { register } from "node:module";

const hooks = `export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: "data:text/javascript,export{}", shortCircuit: true };
  return next(specifier, context);
}`;
register(`data:text/javascript,${encodeURIComponent(hooks)}`);
