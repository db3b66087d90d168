// Preloaded into the project's own Node scripts (seed, mail worker, benchmarks): they are server code
// run outside Next, so the 'server-only' marker resolves to its empty module here, as it does in Next's
// server bundle. Browser bundles still get the throwing version.
const Module = require('node:module');
const path = require('node:path');
const empty = path.join(__dirname, '..', 'node_modules', 'server-only', 'empty.js');
const original = Module._resolveFilename;
Module._resolveFilename = function resolve(request, ...rest) {
  if (request === 'server-only') return empty;
  return original.call(this, request, ...rest);
};
