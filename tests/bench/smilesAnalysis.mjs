// Whole-molecule analysis of drug-sized SMILES: lonepair (dist/core.js, analyzeSmiles: read,
// Kekulé structure, lone pairs, every centre's AXE class, shape, angles and hybridization,
// polarity) against RDKit's WebAssembly build on the same 10,000 molecules in the same run.
//
// RDKit's comparable work is `get_mol` (parse, sanitise: valence, aromaticity, Kekulé form,
// conjugation, hybridization) plus reading each atom's hybridization back with the six SMARTS
// queries [^0]..[^5]; `get_mol` alone is timed too, as RDKit's lower bound. Run it alone with
// `node tests/bench/smilesAnalysis.mjs` after `npm run build`; `npm run bench` runs it after
// run.mjs. `--strict` makes a missed aim exit with status 1.
import { createRequire } from "node:module";
import { existsSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { fileURLToPath, pathToFileURL } from "node:url";
import { drugLikeSmiles, countHeavyAtoms } from "./drugLikeSmiles.mjs";

const AIM_RATIO = 3;
const MOLECULES = 10_000;
const WARM_UP = 2_000;
const AGREEMENT_SAMPLE = 500;

const require = createRequire(import.meta.url);
const grouped = (value) => Math.round(value).toLocaleString("en-US");
const elapsedSeconds = (start) => Number(process.hrtime.bigint() - start) / 1e9;

function loadCore() {
  const corePath = fileURLToPath(new URL("../../dist/core.js", import.meta.url));
  if (!existsSync(corePath)) {
    throw new Error("dist/core.js is missing: run `npm run build` (or `npm run bench`, which builds first).");
  }
  return require(corePath);
}

/** Per-atom hybridization as RDKit answers it ("other" where no query matches). */
function rdkitReader(RDKit) {
  const names = ["s", "sp", "sp2", "sp3", "sp3d", "sp3d2"];
  const queries = names.map((_, degree) => RDKit.get_qmol(`[^${degree}]`));
  return {
    /** get_mol plus the six queries; returns the hybridization array (or undefined if refused). */
    hybridizations(smiles) {
      const mol = RDKit.get_mol(smiles);
      if (mol === null) return undefined;
      const result = new Array(mol.get_num_atoms()).fill("other");
      queries.forEach((query, degree) => {
        const matches = JSON.parse(mol.get_substruct_matches(query));
        if (Array.isArray(matches)) for (const match of matches) result[match.atoms[0]] = names[degree];
      });
      mol.delete();
      return result;
    },
    /** get_mol alone: RDKit's parse and sanitisation, nothing read back. */
    parseOnly(smiles) {
      const mol = RDKit.get_mol(smiles);
      if (mol === null) return false;
      mol.delete();
      return true;
    },
    release() {
      for (const query of queries) query.delete();
    },
  };
}

/**
 * Times each contender on the same molecules, taking turns chunk by chunk, so that a change in
 * the machine's load during the run falls on all of them alike.
 */
function timeInTurns(inputs, contenders, chunkSize = 500) {
  const totals = contenders.map(() => ({ seconds: 0, done: 0 }));
  for (let offset = 0; offset < inputs.length; offset += chunkSize) {
    const chunk = inputs.slice(offset, offset + chunkSize);
    contenders.forEach((work, index) => {
      const start = process.hrtime.bigint();
      for (const smiles of chunk) if (work(smiles)) totals[index].done += 1;
      totals[index].seconds += elapsedSeconds(start);
    });
  }
  return totals.map((total) => ({ ...total, perSecond: inputs.length / total.seconds }));
}

/** Share of heavy-atom centres on which lonepair and RDKit give the same hybridization. */
function agreement(core, rdkit, inputs) {
  let centres = 0;
  let same = 0;
  const differing = new Map();
  for (const smiles of inputs) {
    const ours = core.analyzeSmiles(smiles);
    const theirs = rdkit.hybridizations(smiles);
    if (!ours.ok || theirs === undefined) continue;
    for (const centre of ours.value.centres) {
      if (centre.index >= theirs.length) continue;
      centres += 1;
      if (centre.hybridization === theirs[centre.index]) same += 1;
      else {
        const key = `${centre.atom} ${centre.hybridization}/${theirs[centre.index]}`;
        differing.set(key, (differing.get(key) ?? 0) + 1);
      }
    }
  }
  return { centres, same, differing };
}

/** Runs the benchmark, prints its lines, and returns the labels of missed aims. */
export async function runSmilesAnalysisBench() {
  const core = loadCore();
  const RDKit = await require("@rdkit/rdkit")();
  const rdkit = rdkitReader(RDKit);
  const missed = [];

  const measured = drugLikeSmiles(MOLECULES);
  // Warm-up molecules come from another seed, so lonepair's memo never holds a measured one.
  const warmUp = drugLikeSmiles(WARM_UP, { seed: 7 });
  const heavyAtoms = measured.map(countHeavyAtoms);
  const meanHeavy = heavyAtoms.reduce((sum, count) => sum + count, 0) / heavyAtoms.length;
  // The load average is printed because timings on a busy machine say little about the code.
  console.log(
    `\nSMILES analysis   load ${loadavg()[0].toFixed(2)} on ${availableParallelism()} CPUs; ${grouped(measured.length)} drug-sized molecules, ${Math.min(...heavyAtoms)}-${Math.max(...heavyAtoms)}` +
      ` heavy atoms (mean ${meanHeavy.toFixed(1)}), seeded`,
  );

  for (const smiles of warmUp) core.analyzeSmiles(smiles);
  for (const smiles of warmUp) rdkit.hybridizations(smiles);

  const [ours, theirs, theirsParseOnly] = timeInTurns(measured, [
    (smiles) => core.analyzeSmiles(smiles).ok,
    (smiles) => rdkit.hybridizations(smiles) !== undefined,
    (smiles) => rdkit.parseOnly(smiles),
  ]);
  const ratio = ours.perSecond / theirs.perSecond;

  const line = (label, run) =>
    console.log(
      `  ${label.padEnd(44)} ${grouped(run.perSecond).padStart(8)} SMILES/s  (${grouped(run.done)} analysed, ${run.seconds.toFixed(1)} s)`,
    );
  line("lonepair analyzeSmiles (all centres)", ours);
  line("RDKit get_mol + hybridization queries", theirs);
  line("RDKit get_mol alone (lower bound)", theirsParseOnly);
  const met = ratio >= AIM_RATIO;
  if (!met) missed.push("SMILES analysis vs RDKit");
  console.log(
    `  ratio lonepair / RDKit ${ratio.toFixed(2)}x (vs get_mol alone ${(ours.perSecond / theirsParseOnly.perSecond).toFixed(2)}x)` +
      `   aim >= ${AIM_RATIO}x   ${met ? "meets aim" : "MISSES aim"}`,
  );

  const { centres, same, differing } = agreement(core, rdkit, measured.slice(0, AGREEMENT_SAMPLE));
  const top = [...differing.entries()].sort((a, b) => b[1] - a[1]).slice(0, 4);
  console.log(
    `  hybridization agreement on ${AGREEMENT_SAMPLE} molecules: ${same}/${centres} heavy-atom centres` +
      ` (${((100 * same) / Math.max(centres, 1)).toFixed(1)}%)` +
      (top.length ? `; lonepair/RDKit differ: ${top.map(([key, count]) => `${key} x${count}`).join(", ")}` : ""),
  );
  rdkit.release();
  return missed;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const missed = await runSmilesAnalysisBench();
  if (missed.length > 0 && process.argv.includes("--strict")) process.exitCode = 1;
}
