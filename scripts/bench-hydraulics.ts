/**
 * Benchmark of evaluateRun: one run of 10,000 readings and 1,000 runs of 50 readings.
 * Targets on the 2-core machines: under 20 ms and under 200 ms. Prints figures; asserts nothing.
 * Run: npx tsx scripts/bench-hydraulics.ts
 */
import { evaluateRun, type Reading, type RunInput } from "../lib/hydraulics/index";

function makeRun(count: number, seed: number, method: RunInput["method"]): RunInput {
  let s = seed >>> 0;
  const rand = () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  const readings: Reading[] = [];
  let vin = 0;
  let vout = 0;
  for (let i = 0; i < count; i++) {
    if (i > 0) {
      const dv = (1 + 2 * Math.exp(-i / 20)) * (1 + 0.04 * (rand() - 0.5));
      vin += dv;
      vout += dv * (0.95 + 0.04 * (rand() - 0.5));
    }
    readings.push({
      elapsedS: i * 3600,
      inflowMl: vin,
      outflowMl: vout,
      headKPa: 14 + 0.2 * (rand() - 0.5),
      temperatureC: 20 + 2 * (rand() - 0.5),
      influentEcMsPerM: 100,
      effluentEcMsPerM: 100 + 10 * rand(),
      influentPh: 7,
      effluentPh: 7 + 0.4 * (rand() - 0.5),
    });
  }
  return { method, specimen: { diameterMm: 100, thicknessMm: 5, bentoniteMassPerAreaKgPerM2: 3.66 }, readings };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
const methods: RunInput["method"][] = ["D5887", "D5084", "D6766"];

// Inputs are built before timing so that only evaluateRun is measured.
const big = makeRun(10_000, 1, "D5084");
const small = Array.from({ length: 1000 }, (_, i) => makeRun(50, i + 2, methods[i % 3] as RunInput["method"]));

// Cold: the first calls in a fresh process, before the JIT has optimised anything.
let t = performance.now();
evaluateRun(big);
const coldBigMs = performance.now() - t;
t = performance.now();
for (const r of small) evaluateRun(r);
const coldSmallMs = performance.now() - t;

// Warm up further, as a long-running server would be.
for (let i = 0; i < 5; i++) evaluateRun(big);

const bigTimes: number[] = [];
for (let rep = 0; rep < 15; rep++) {
  const t0 = performance.now();
  evaluateRun(big);
  bigTimes.push(performance.now() - t0);
}
const smallTimes: number[] = [];
for (let rep = 0; rep < 7; rep++) {
  const t0 = performance.now();
  for (const r of small) evaluateRun(r);
  smallTimes.push(performance.now() - t0);
}

console.log("evaluateRun benchmark (node " + process.version + ")");
console.log(`  cold, first call        : 10,000 readings ${coldBigMs.toFixed(2)} ms; 1,000 x 50 readings ${coldSmallMs.toFixed(2)} ms`);
console.log(`  1 run x 10,000 readings : median ${median(bigTimes).toFixed(2)} ms, min ${Math.min(...bigTimes).toFixed(2)} ms, max ${Math.max(...bigTimes).toFixed(2)} ms over ${bigTimes.length} reps (target < 20 ms)`);
console.log(`  1,000 runs x 50 readings: median ${median(smallTimes).toFixed(2)} ms, min ${Math.min(...smallTimes).toFixed(2)} ms, max ${Math.max(...smallTimes).toFixed(2)} ms over ${smallTimes.length} reps (target < 200 ms)`);
