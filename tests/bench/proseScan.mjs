// Speed of finding species in running prose: a markdown lab notebook of about 2 MB, written from
// seeded sentences that mix names (one and several words, Stock and organic names), formulas,
// abbreviations and ordinary words, scanned by analyzeDocument from the bundled core.
// Run alone with `node tests/bench/proseScan.mjs` after `npm run build`; run.mjs calls it too.
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";

const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));

/** Megabytes of prose scanned per second, best of the timed runs: a 100 kB notebook in a tenth of a second. */
const AIM_MEGABYTES_PER_SECOND = 1;

const SENTENCES = [
  "Run 31 rinsed the cell with acetone, then ethyl acetate, and dried it under nitrogen for an hour.",
  "The copper(II) sulfate bath and the iron (III) chloride etch were made up by the morning shift.",
  "Hexanes/EtOAc 4:1 moved the ester; DCM and THF were kept for the next week in bay C.",
  "SF6 and NF3 lines were purged; the ClF3 cylinder KR-0412 stayed closed in room 2.14.",
  "A general method for the chemical signal: the hexagonal cell reads it alone, without help.",
  "Store ammonium chloride apart from sulfuric acid, nitric acid and sodium hydroxide pellets.",
  "We checked propan-2-ol, 1,2-dichloroethane and butan-2-one against the supplier's certificates.",
  "Lime water turned milky; the nitrate ion and chloride ions were measured by the field kit.",
  "The nitrogen atom keeps one lone pair, and the two hydrogen atoms sit in the mirror plane.",
  "Glycerol, glucose, citric acid and phenolphthalein went on the teaching shelf with silica gel.",
  "Ferric chloride, stannous fluoride and cupric sulfate are the old names on the back labels.",
  "NH4+ and SO4^2- were in the scrubber liquor, with \\ce{H2O} and a trace of HF at 3 ppm.",
];

function notebook(targetCharacters) {
  let seed = 7;
  const random = () => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x7fffffff;
  };
  const parts = [];
  let length = 0;
  let paragraph = 0;
  while (length < targetCharacters) {
    if (paragraph % 12 === 0) parts.push(`\n## Run ${paragraph / 12 + 1}\n\n`);
    const sentences = [];
    for (let count = 0; count < 5; count += 1) sentences.push(SENTENCES[Math.floor(random() * SENTENCES.length)]);
    const text = `${sentences.join(" ")}\n\n`;
    parts.push(text);
    length += text.length;
    paragraph += 1;
  }
  return parts.join("");
}

/** Prints the figure; returns the names of the aims missed. */
export function runProseScanBench() {
  if (!existsSync(corePath)) {
    throw new Error("dist/core.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  }
  const { analyzeDocument } = createRequire(import.meta.url)(corePath);
  const text = notebook(2_000_000);
  // Warm the code and the readers' memos on a smaller document first.
  analyzeDocument(text.slice(0, 200_000), "markdown");
  let best = Infinity;
  let found = 0;
  for (let run = 0; run < 3; run += 1) {
    const start = process.hrtime.bigint();
    found = analyzeDocument(text, "markdown").occurrences.length;
    best = Math.min(best, Number(process.hrtime.bigint() - start) / 1e6);
  }
  const megabytesPerSecond = text.length / 1e6 / (best / 1000);
  const met = megabytesPerSecond >= AIM_MEGABYTES_PER_SECOND;
  console.log(
    `\nprose scan        ${(text.length / 1e6).toFixed(1)} MB markdown, ${found.toLocaleString("en-US")} species found` +
      `  ${megabytesPerSecond.toFixed(1).padStart(6)} MB/s   aim >= ${AIM_MEGABYTES_PER_SECOND} MB/s   ${met ? "meets aim" : "MISSES aim"}`,
  );
  return met ? [] : ["prose scan"];
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const missed = runProseScanBench();
  if (missed.length > 0 && process.argv.includes("--strict")) process.exitCode = 1;
}
