// A worker thread that computes its share of light-map rows for `npm run bench` (the browser's helper
// is components/coverage/coverageShare.worker.ts). Worker threads do not inherit tsx's loader, so it is
// registered here before the TypeScript is loaded; the port arrives in workerData.
require('tsx/cjs');
const { workerData } = require('node:worker_threads');
const { serveSharesOnPort } = require('../lib/analysis/coverage/sharePorts.ts');

serveSharesOnPort(workerData.port);
