/**
 * Benchmark of certificate PDFs: 20 invented snapshots (1-3 tests, charts of 10-200 points) rendered one
 * after another in one warm browser, after a cold first render that is reported apart; then 5 at once.
 * Target on the 2-core machines: p95 under 2 s. Prints figures; asserts nothing.
 * Run: npx tsx scripts/bench-certificates.ts   (not with --conditions=react-server: renderDocumentHtml
 * loads the Node build of react-dom/server, which that condition replaces)
 */
import Module from "node:module";
import path from "node:path";
import { performance } from "node:perf_hooks";

// lib/server modules import the "server-only" marker, which throws outside a react-server build. Here,
// as in the tests (vitest.config.mts), it has nothing to guard, so it resolves to the package's empty module.
const moduleWithResolver = Module as unknown as { _resolveFilename: (request: string, ...rest: unknown[]) => string };
const resolveFilename = moduleWithResolver._resolveFilename;
const emptyServerOnly = path.join(process.cwd(), "node_modules/server-only/empty.js");
moduleWithResolver._resolveFilename = function (request, ...rest) {
  return resolveFilename.call(this, request === "server-only" ? emptyServerOnly : request, ...rest);
};

const COUNT = 20;
const CONCURRENT = 5;

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]!;
const seconds = (ms: number) => (ms / 1000).toFixed(3);

async function main() {
  const { renderCertificatePdf } = await import("../lib/server/certificates/render-certificate-pdf");
  const { closePdfBrowser } = await import("../lib/server/pdf/render-pdf");
  const { makeCertificateSnapshot } = await import("../tests/support/make-certificate-snapshot");

  // Tests 1, 2, 3, 1, 2, 3...; chart lengths spread evenly from 10 to 200 points.
  const snapshots = Array.from({ length: COUNT }, (_, i) =>
    makeCertificateSnapshot({ seed: i + 1, tests: 1 + (i % 3), chartPoints: Math.round(10 + (190 * i) / (COUNT - 1)), supersedes: i % 4 === 3, deviations: i % 5 === 0 }),
  );

  try {
    let t = performance.now();
    const cold = await renderCertificatePdf(snapshots[0]!);
    const coldMs = performance.now() - t;

    const times: number[] = [];
    const sizes: number[] = [];
    for (const snapshot of snapshots) {
      t = performance.now();
      const pdf = await renderCertificatePdf(snapshot);
      times.push(performance.now() - t);
      sizes.push(pdf.length);
    }
    const sorted = [...times].sort((a, b) => a - b);

    t = performance.now();
    const each = await Promise.all(
      snapshots.slice(0, CONCURRENT).map(async (snapshot) => {
        const start = performance.now();
        await renderCertificatePdf(snapshot);
        return performance.now() - start;
      }),
    );
    const concurrentMs = performance.now() - t;

    const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
    console.log(`certificate PDFs (${COUNT} snapshots, 1-3 tests, charts of 10-200 points)`);
    console.log(`  cold first render (browser start): ${seconds(coldMs)} s, ${(cold.length / 1024).toFixed(0)} KiB`);
    console.log(`  warm, one after another:           p50 ${seconds(quantile(sorted, 0.5))} s   p95 ${seconds(quantile(sorted, 0.95))} s   max ${seconds(sorted[sorted.length - 1]!)} s   (target p95 < 2 s)`);
    console.log(`  mean PDF size:                     ${(mean(sizes) / 1024).toFixed(0)} KiB (smallest ${(Math.min(...sizes) / 1024).toFixed(0)}, largest ${(Math.max(...sizes) / 1024).toFixed(0)})`);
    console.log(`  ${CONCURRENT} at once (queue of 2):           all done in ${seconds(concurrentMs)} s; each waited and rendered ${each.map(seconds).join(", ")} s`);
  } finally {
    await closePdfBrowser();
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});
