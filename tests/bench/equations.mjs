// Speed of checking equations: a markdown notebook of 10,000 equations (mhchem spans and text
// lines, balanced and not, from a seeded mix), read and checked by analyzeDocument and
// checkDocument from the bundled core. Prints equations checked per second.
// Run alone with `node tests/bench/equations.mjs` after `npm run build`; run.mjs calls it too.
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { fileURLToPath, pathToFileURL } from "node:url";

const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));

/** Equations read, balanced and reported per second, best of the timed runs: the notebook in 2 s. */
const AIM_EQUATIONS_PER_SECOND = 5_000;
const EQUATIONS = 10_000;

// A mix of balanced and unbalanced equations, as lab write-ups carry them.
const TEMPLATES = [
  (k) => `\\ce{${k} H2 + O2 -> ${k} H2O}`,
  (k) => `C3H8 + ${k} O2 → 3 CO2 + 4 H2O`,
  (k) => `\\ce{MnO4- + 8 H+ + ${k} Fe^2+ -> Mn^2+ + 5 Fe^3+ + 4 H2O}`,
  (k) => `${k}Al + 3O2 → 2Al2O3`,
  (k) => `\\ce{CuSO4*5H2O ->[{heat}] CuSO4 + ${k} H2O}`,
  (k) => `- Ca2+ + ${k} F- → CaF2`,
  (k) => `\\ce{CH3COOH + C2H5OH <=>[H2SO4] CH3COOC2H5 + ${k} H2O}`,
  (k) => `Cr2O7^2- + 14 H+ + ${k} e- → 2 Cr3+ + 7 H2O`,
  // Skeletons that complete in acidic or basic solution.
  (k) => `\\ce{MnO4- + ${k} Fe^2+ -> Mn^2+ + Fe^3+}`,
];

function notebook() {
  let seed = 11;
  const random = () => {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    return seed / 0x7fffffff;
  };
  const lines = [];
  for (let index = 0; index < EQUATIONS; index += 1) {
    if (index % 20 === 0) lines.push(`\n## Run ${index / 20 + 1} (Bay C)\n`);
    const template = TEMPLATES[Math.floor(random() * TEMPLATES.length)];
    lines.push(template(1 + Math.floor(random() * 6)), "");
  }
  return lines.join("\n");
}

/** Prints the figure; returns the names of the aims missed. */
export function runEquationsBench() {
  if (!existsSync(corePath)) {
    throw new Error("dist/core.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  }
  const { analyzeDocument, checkDocument } = createRequire(import.meta.url)(corePath);
  const text = notebook();
  checkDocument(analyzeDocument(text.slice(0, 50_000), "markdown"));
  let best = Infinity;
  let read = 0;
  let reported = 0;
  for (let run = 0; run < 3; run += 1) {
    const started = process.hrtime.bigint();
    const model = analyzeDocument(text, "markdown");
    const findings = checkDocument(model);
    const seconds = Number(process.hrtime.bigint() - started) / 1e9;
    best = Math.min(best, seconds);
    read = model.reactions.length;
    reported = findings.filter((finding) => finding.code.startsWith("equation-")).length;
  }
  const perSecond = read / best;
  const met = perSecond >= AIM_EQUATIONS_PER_SECOND && read === EQUATIONS;
  console.log(
    `equations checked ${Math.round(perSecond).toLocaleString("en-US").padStart(10)} /s  ` +
      `(${read.toLocaleString("en-US")} of ${EQUATIONS.toLocaleString("en-US")} read, ${reported.toLocaleString("en-US")} unbalanced, ` +
      `${(best * 1000).toFixed(0)} ms for the notebook)   aim >= ${AIM_EQUATIONS_PER_SECOND.toLocaleString("en-US")} /s   ` +
      `${met ? "meets aim" : "MISSES aim"}`,
  );
  return met ? [] : ["equations checked"];
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) runEquationsBench();
