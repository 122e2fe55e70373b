// 3D model coordinates and point group of drug-sized SMILES: `shapeOf` on an analysis from
// `analyzeSmiles` (dist/core.js). A hover on a SMILES asks for its polarity, and a molecule with
// several centres needs its 3D model for that, so this is on the hover path. Each molecule is
// analysed first (untimed: the SMILES analysis line times that) and then timed once, cold, in CPU
// time, since the machine may be shared. Run it alone with `node tests/bench/coordinates.mjs`
// after `npm run build`; run.mjs runs it too. `--strict` makes a missed aim exit with status 1.
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { fileURLToPath, pathToFileURL } from "node:url";
import { drugLikeSmiles, countHeavyAtoms } from "./drugLikeSmiles.mjs";

const AIM_MEDIAN_MILLISECONDS = 20;
// The vibrational analysis follows the model on the hover path; it reuses the model's symmetry
// search, so it should add little.
const AIM_VIBRATIONS_MEDIAN_MILLISECONDS = 2;
const MOLECULES = 300;
const WARM_UP = 40;

const require = createRequire(import.meta.url);
const cpuMilliseconds = () => {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
};

function loadCore() {
  const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));
  if (!existsSync(corePath)) {
    throw new Error("dist/core.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  }
  return require(corePath);
}

/** Runs the benchmark, prints its lines, and returns the labels of missed aims. */
export function runCoordinatesBench() {
  const { analyzeSmiles, shapeOf, vibrationsOf } = loadCore();
  const missed = [];
  const measured = drugLikeSmiles(MOLECULES);
  // Warm-up molecules come from another seed (and never repeat a measured one), so no shape the
  // memo holds is timed.
  const measuredSet = new Set(measured);
  const warmUp = drugLikeSmiles(WARM_UP, { seed: 11 }).filter((smiles) => !measuredSet.has(smiles));
  for (const smiles of warmUp) {
    const analysis = analyzeSmiles(smiles);
    if (analysis.ok) shapeOf(analysis.value);
  }

  const times = [];
  const vibrationTimes = [];
  let withoutVibrations = 0;
  const atomCounts = [];
  let withoutGroup = 0;
  let notAnalysed = 0;
  let slowest = { milliseconds: 0, smiles: "" };
  for (const smiles of measured) {
    const analysis = analyzeSmiles(smiles);
    if (!analysis.ok) {
      notAnalysed += 1;
      continue;
    }
    const start = cpuMilliseconds();
    const shape = shapeOf(analysis.value);
    const milliseconds = cpuMilliseconds() - start;
    times.push(milliseconds);
    atomCounts.push(shape.coordinates.atoms.length);
    if (shape.pointGroup === undefined) withoutGroup += 1;
    if (milliseconds > slowest.milliseconds) slowest = { milliseconds, smiles };
    const vibrationStart = cpuMilliseconds();
    const vibrations = vibrationsOf(analysis.value);
    vibrationTimes.push(cpuMilliseconds() - vibrationStart);
    if (!vibrations.ok) withoutVibrations += 1;
  }

  const sorted = [...times].sort((a, b) => a - b);
  const at = (fraction) => sorted[Math.min(sorted.length - 1, Math.floor(fraction * sorted.length))] ?? Number.NaN;
  const median = at(0.5);
  const heavy = measured.map(countHeavyAtoms);
  const meanAtoms = atomCounts.reduce((sum, count) => sum + count, 0) / Math.max(atomCounts.length, 1);
  // The load average is printed because timings on a busy machine say little about the code.
  console.log(
    `\n3D coordinates    load ${loadavg()[0].toFixed(2)} on ${availableParallelism()} CPUs; shapeOf on ${times.length} drug-sized molecules,` +
      ` ${Math.min(...heavy)}-${Math.max(...heavy)} heavy atoms (mean ${meanAtoms.toFixed(0)} atoms with H), seeded, CPU time`,
  );
  // Molecules that were not analysed were not timed either: a median over the rest would flatter.
  const met = median < AIM_MEDIAN_MILLISECONDS && notAnalysed === 0;
  if (!met) missed.push("3D coordinates");
  console.log(
    `  median ${median.toFixed(2)} ms  p95 ${at(0.95).toFixed(2)} ms per molecule` +
      `   aim: median < ${AIM_MEDIAN_MILLISECONDS} ms   ${met ? "meets aim" : "MISSES aim"}`,
  );
  console.log(
    `  slowest ${slowest.milliseconds.toFixed(1)} ms (${countHeavyAtoms(slowest.smiles)} heavy atoms); ` +
      `${withoutGroup} without a point group (aim 0); ${notAnalysed} not analysed (aim 0)`,
  );
  if (withoutGroup > 0) missed.push("3D point groups");
  const vibrationSorted = [...vibrationTimes].sort((a, b) => a - b);
  const vibrationAt = (fraction) =>
    vibrationSorted[Math.min(vibrationSorted.length - 1, Math.floor(fraction * vibrationSorted.length))] ?? Number.NaN;
  const vibrationMedian = vibrationAt(0.5);
  const vibrationsMet = vibrationMedian < AIM_VIBRATIONS_MEDIAN_MILLISECONDS;
  if (!vibrationsMet) missed.push("vibrations");
  console.log(
    `  vibrations after the model: median ${vibrationMedian.toFixed(2)} ms  p95 ${vibrationAt(0.95).toFixed(2)} ms` +
      `   aim: median < ${AIM_VIBRATIONS_MEDIAN_MILLISECONDS} ms   ${vibrationsMet ? "meets aim" : "MISSES aim"};` +
      ` ${withoutVibrations} without a result`,
  );
  return missed;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const missed = runCoordinatesBench();
  if (missed.length > 0 && process.argv.includes("--strict")) process.exitCode = 1;
}
