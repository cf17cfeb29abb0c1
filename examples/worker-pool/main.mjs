// Spreading a large batch of water states over all cores with a worker-thread pool (piscina).
// Scenario of our own: a design sweep over 10 million (p, T) states of a district-heating network.
//
//   node examples/worker-pool/main.mjs            (10 million states; needs `npm run build` first)
//   HEATSTATE_STATES=200000 node examples/worker-pool/main.mjs
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { waterBatch } from 'heatstate/water';

const N = Number(process.env.HEATSTATE_STATES ?? 10_000_000);
const threads = availableParallelism();
const CHUNK = Math.max(10_000, Math.ceil(N / (threads * 8)));

// inputs and outputs live in shared memory, so the workers read and write them in place
const shared = (Type) => new SharedArrayBuffer(N * Type.BYTES_PER_ELEMENT);
const buffers = { p: shared(Float64Array), T: shared(Float64Array), h: shared(Float64Array), rho: shared(Float64Array), status: shared(Uint8Array) };
// the sweep: 2-25 bar, 40-180 °C (liquid and some steam)
const p = new Float64Array(buffers.p);
const T = new Float64Array(buffers.T);
for (let i = 0; i < N; i++) {
  p[i] = 2e5 + (i % 1000) * 2.3e3;
  T[i] = 313.15 + ((i * 7919) % 14000) / 100;
}

// one thread
let t0 = performance.now();
const single = waterBatch({ p, T }, ['h', 'rho']);
const singleMs = performance.now() - t0;

// the pool
const pool = new Piscina({ filename: fileURLToPath(new URL('./worker.mjs', import.meta.url)), maxThreads: threads, minThreads: threads });
// warm the workers (module load, JIT) on a first slice before timing
await Promise.all(Array.from({ length: threads }, () => pool.run({ buffers, start: 0, end: Math.min(N, 20_000) })));
t0 = performance.now();
const tasks = [];
for (let start = 0; start < N; start += CHUNK) tasks.push(pool.run({ buffers, start, end: Math.min(N, start + CHUNK) }));
const bad = (await Promise.all(tasks)).reduce((a, b) => a + b, 0);
const h = new Float64Array(buffers.h);
const poolMs = performance.now() - t0;
await pool.destroy();

let mismatches = 0;
for (let i = 0; i < N; i++) if (!(h[i] === single.h[i] || (Number.isNaN(h[i]) && Number.isNaN(single.h[i])))) mismatches++;

console.log(`states: ${N.toLocaleString('en-US')}, threads: ${threads}, chunk: ${CHUNK.toLocaleString('en-US')}`);
console.log(`one thread: ${singleMs.toFixed(0)} ms (${((N / singleMs) * 1e-3).toFixed(2)} million states/s)`);
console.log(`pool:       ${poolMs.toFixed(0)} ms (${((N / poolMs) * 1e-3).toFixed(2)} million states/s), speed-up ${(singleMs / poolMs).toFixed(2)}×`);
console.log(`elements with a bad status: ${bad}; pool results differing from one thread: ${mismatches}`);
