/**
 * Build-time loader for lib/engine/assess-pool.ts (wired in next.config.ts, turbopack.rules).
 *
 * The engine starts its worker with `new Worker(path)` where the path is computed at run time.
 * Turbopack treats every `new Worker(...)` as a bundle entry and, for a computed path, tries to
 * bundle every file of the project as a worker (Markdown, fonts, tests …), which fails the build
 * ("Unknown module type", 45 errors; checked with next 16.4.6). The documented magic comment
 * `/* turbopackIgnore: true *\/` on the argument did not stop it (tried). So this loader rewrites
 * `new Worker(a, b)` to `Reflect.construct(Worker, [a, b])`, which the bundler does not take for a
 * worker entry, and the worker's folder (`__dirname`, unknown to the bundler, so it traced and
 * compiled the whole project, eslint.config.mjs and its plugins included) to null, so the pool
 * answers "worker entry not found" and the engine runs in-process. The first rewrite alone still
 * failed the build (tried); with both, `next build` passes. The engine's source is not changed; if
 * its text changes, a rewrite silently stops matching and the build error comes back.
 *
 * In the application the engine runs in-process (lib/data/outlooks.ts passes useWorkers: false),
 * so the worker is never started there. Remove this loader and its rule once the engine constructs
 * its worker in a way the bundler leaves alone.
 */
module.exports = function workerConstructLoader(source) {
  return source
    .replace(/new Worker\(([^()]*)\)/g, 'Reflect.construct(Worker, [$1])')
    .replace("typeof __dirname === 'string' ? __dirname : null", 'null');
};
