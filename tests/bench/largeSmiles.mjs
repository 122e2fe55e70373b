// One large species at a time: SMILES of 1,000 and 10,000 atoms (chains, rings, aromatic rings,
// fused aromatics, many fragments, branches), each analysed cold, then its 3D model (or the quick
// refusal past the size limit) and its hover card, in CPU time since the machine may be shared.
// The growth from 1,000 to 10,000 atoms shows whether a stage is near-linear (about x10). Then the
// 3D coordinates of chains of 1,000 and 2,000 carbons, and the 3D view of a 999-carbon chain. Run alone with
// `node tests/bench/largeSmiles.mjs` after `npm run build`; run.mjs runs it too.
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";

/** Ten times the atoms should cost about ten times the time; this allows for a log factor and noise. */
const AIM_GROWTH = 20;
/** A 3D model of a 2,000-carbon chain (6,002 atoms) in CPU time. */
const AIM_CHAIN_MODEL_MILLISECONDS = 2000;
/** The 3D view's model (starting orientation included) of a 999-carbon chain, its 3D model already built, in CPU time. */
const AIM_CHAIN_VIEW_MILLISECONDS = 1000;

const require = createRequire(import.meta.url);
const cpuMilliseconds = () => {
  const { user, system } = process.cpuUsage();
  return (user + system) / 1000;
};

/** The large species, written out for `heavyAtoms` atoms other than hydrogen (roughly). */
const KINDS = [
  ["chain", (n) => "C".repeat(n)],
  ["ring", (n) => `C1${"C".repeat(n - 2)}C1`],
  ["aromatic ring", (n) => `c1${"c".repeat(n - 2)}c1`],
  ["fused aromatics", (n) => Array.from({ length: Math.round(n / 10) }, () => "c1ccc2ccccc2c1").join(".")],
  ["fragments", (n) => Array.from({ length: Math.round(n / 3) }, () => "OCO").join(".")],
  ["branched", (n) => "C(C)".repeat(Math.round(n / 2))],
];

function timed(work) {
  const start = cpuMilliseconds();
  const value = work();
  return { value, milliseconds: cpuMilliseconds() - start };
}

function stagesOf(core, smiles) {
  const analysis = timed(() => core.analyzeSmiles(smiles));
  if (!analysis.value.ok) return { failed: analysis.value.problem.message };
  const species = analysis.value.value;
  const model = timed(() => core.shapeOf(species));
  const hover = timed(() => core.hoverMarkdown(species, { angleDecimals: 1 }));
  return {
    atoms: species.graph.atoms.length,
    analyse: analysis.milliseconds,
    model: model.milliseconds,
    modelNote: model.value.coordinates.tooLarge ? "declined, too large" : `${model.value.coordinates.atoms.length} atoms placed`,
    hover: hover.milliseconds,
  };
}

const ms = (value) => `${value.toFixed(0).padStart(6)} ms`;
const growth = (small, large) => (small > 0.5 ? `x${(large / small).toFixed(1)}` : "n/a");

/** Runs the benchmark, prints its lines, and returns the labels of missed aims. */
export function runLargeSmilesBench() {
  const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));
  if (!existsSync(corePath)) throw new Error("dist/core.js is missing: run `npm run build` first.");
  const core = require(corePath);
  const missed = [];
  // Warm the code on small species of every kind, so the figures are not compile time.
  for (const [, make] of KINDS) stagesOf(core, make(60));

  console.log("large SMILES      one species, CPU ms: analysis | 3D model (or refusal) | hover card");
  for (const [kind, make] of KINDS) {
    const small = stagesOf(core, make(1000));
    const large = stagesOf(core, make(10_000));
    if (small.failed || large.failed) {
      console.log(`  ${kind.padEnd(16)} NOT ANALYSED: ${small.failed ?? large.failed}`);
      missed.push(`large SMILES ${kind}`);
      continue;
    }
    for (const [label, stage] of [
      ["1,000", small],
      ["10,000", large],
    ]) {
      console.log(
        `  ${kind.padEnd(16)} ${label.padStart(6)} (${String(stage.atoms).padStart(6)} atoms)` +
          `  ${ms(stage.analyse)} | ${ms(stage.model)} ${stage.modelNote.padEnd(20)} | ${ms(stage.hover)}`,
      );
    }
    const analysisGrowth = large.analyse / Math.max(small.analyse, 0.5);
    const met = analysisGrowth <= AIM_GROWTH;
    if (!met) missed.push(`large SMILES ${kind} growth`);
    console.log(
      `  ${"".padEnd(16)} analysis growth for x10 atoms ${growth(small.analyse, large.analyse)}` +
        `   aim <= x${AIM_GROWTH}   ${met ? "meets aim" : "MISSES aim"}`,
    );
  }

  const chainModel = (carbons) => {
    const analysis = core.analyzeSmiles("C".repeat(carbons));
    return timed(() => core.buildCoordinates(analysis.value.graph, false));
  };
  const thousand = chainModel(1000);
  const twoThousand = chainModel(2000);
  const threeThousand = chainModel(3000);
  const met = twoThousand.milliseconds < AIM_CHAIN_MODEL_MILLISECONDS;
  if (!met) missed.push("2,000-carbon chain coordinates");
  console.log(
    `chain coordinates 1,000 C (${thousand.value.atoms.length} atoms) ${ms(thousand.milliseconds)}; ` +
      `2,000 C (${twoThousand.value.atoms.length} atoms) ${ms(twoThousand.milliseconds)}; ` +
      `3,000 C (${threeThousand.value.atoms.length} atoms) ${ms(threeThousand.milliseconds)}`,
  );
  console.log(
    `                  2,000-carbon chain   aim < ${AIM_CHAIN_MODEL_MILLISECONDS} ms   ${met ? "meets aim" : "MISSES aim"}` +
      `   (growth 1,000 -> 3,000 C: ${growth(thousand.milliseconds, threeThousand.milliseconds)} for x3 atoms)`,
  );

  // The view turns the model until no ball hides another: some 300 views of 2,999 atoms.
  const longChain = core.analyzeSmiles("C".repeat(999)).value;
  core.shapeOf(longChain);
  const view = timed(() => core.shapeViewModelOf(longChain));
  const viewMet = view.milliseconds < AIM_CHAIN_VIEW_MILLISECONDS;
  if (!viewMet) missed.push("999-carbon chain view");
  console.log(
    `chain 3D view     999 C (${view.value?.atoms.length ?? 0} atoms) ${ms(view.milliseconds)}   ` +
      `aim < ${AIM_CHAIN_VIEW_MILLISECONDS} ms   ${viewMet ? "meets aim" : "MISSES aim"}`,
  );
  return missed;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const missed = runLargeSmilesBench();
  if (missed.length > 0) {
    console.log(`\nmissed: ${missed.join(", ")}`);
    if (process.argv.includes("--strict")) process.exitCode = 1;
  }
}
