/**
 * Preloaded (`tsx --require ./scripts/server-process.cjs`) by every server process that is not Next:
 * the scripts, the worker, the engine's thread pool. The `server-only` marker keeps modules out of
 * browser bundles; it throws on import outside React's server environment, so here, where there is no
 * browser, it resolves to an empty module.
 */
const Module = require('node:module');
const path = require('node:path');

const empty = path.join(__dirname, 'server-only-empty.cjs');
const resolve = Module._resolveFilename;
Module._resolveFilename = function resolveServerOnly(request, ...rest) {
  return request === 'server-only' ? empty : resolve.call(this, request, ...rest);
};
