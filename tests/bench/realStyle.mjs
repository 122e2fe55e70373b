// Species spotting on documents written the way other people write them (tests/fixtures/real-style):
// precision and recall of the bundled core (dist/core.js), per style and overall, beside the aims.
// The scoring rules are the unit test's own (tests/document/realStyleScore.ts), bundled here in
// memory with esbuild, so the benchmark and the test can never count differently.
// Run alone with `node tests/bench/realStyle.mjs` after `npm run build`; run.mjs calls it too.
import { build } from "esbuild";
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";

const scorerPath = fileURLToPath(new URL("../document/realStyleScore.ts", import.meta.url));
const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));

async function loadScorer() {
  const bundled = await build({
    entryPoints: [scorerPath],
    bundle: true,
    write: false,
    format: "esm",
    platform: "node",
    target: "node20",
    logLevel: "warning",
    // The scorer finds the corpus beside itself; in memory it has no folder of its own.
    define: { __dirname: JSON.stringify(fileURLToPath(new URL("../document", import.meta.url))) },
  });
  const source = bundled.outputFiles[0].text;
  return import(`data:text/javascript;base64,${Buffer.from(source).toString("base64")}`);
}

/** Prints the scores; returns the names of the aims missed. */
export async function runRealStyleBench() {
  if (!existsSync(corePath)) {
    throw new Error("dist/core.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  }
  const { analyzeDocument, documentKindFor, readSpecies } = createRequire(import.meta.url)(corePath);
  const { scoreRealStyleCorpus, formatScoreTable, PRECISION_AIM, RECALL_AIM } = await loadScorer();
  const score = scoreRealStyleCorpus({ analyzeDocument, documentKindFor, readSpecies });
  const { overall } = score;
  const missed = [];
  const verdict = (met, label) => {
    if (!met) missed.push(label);
    return met ? "meets aim" : "MISSES aim";
  };
  console.log(`\nspotting on real-style documents  ${overall.documents} documents, ${overall.labels} labelled species spans`);
  console.log(
    `  precision ${overall.precision.toFixed(3)}   aim >= ${PRECISION_AIM.toFixed(2)}   ${verdict(overall.precision >= PRECISION_AIM, "real-style precision")}`,
  );
  console.log(
    `  recall    ${overall.recall.toFixed(3)}   aim >= ${RECALL_AIM.toFixed(2)}   ${verdict(overall.recall >= RECALL_AIM, "real-style recall")}`,
  );
  console.log(formatScoreTable(score).replace(/^/gm, "  "));
  return missed;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const missed = await runRealStyleBench();
  if (missed.length > 0 && process.argv.includes("--strict")) process.exitCode = 1;
}
