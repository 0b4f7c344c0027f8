import 'vitest-canvas-mock';
import fc from 'fast-check';

// Property tests run from a fixed seed so a run is repeatable (no flakes in CI). Set
// FAST_CHECK_SEED to explore other seeds locally; a failure prints its seed and counterexample.
const seed = Number(process.env.FAST_CHECK_SEED ?? 20261201);
fc.configureGlobal({ seed, numRuns: Number(process.env.FAST_CHECK_RUNS ?? 100) });
