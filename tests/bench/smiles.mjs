// Benchmark of the SMILES reader on drug-sized molecules: reading alone, and reading with
// Kekulé assignment and formula, plus the time for one very long chain. Run with
// `node tests/bench/smiles.mjs` (it bundles the reader itself); `--strict` makes a missed aim
// exit with status 1.
import { buildSync } from "esbuild";
import { fileURLToPath } from "node:url";

const entry = fileURLToPath(new URL("../../shared/src/chemistry/smiles/index.ts", import.meta.url));
const bundled = buildSync({ entryPoints: [entry], bundle: true, write: false, format: "cjs", platform: "node" });
const module = { exports: {} };
new Function("module", "exports", bundled.outputFiles[0].text)(module, module.exports);
const { parseSmiles, kekulize, smilesFormula } = module.exports;

const AIM_READ_PER_SECOND = 50_000;
const AIM_FULL_PER_SECOND = 20_000;
const AIM_LONG_CHAIN_MILLISECONDS = 1_000;
const strict = process.argv.includes("--strict");

// Drug-like molecules written for this benchmark (aromatic rings, stereo marks, charges).
const MOLECULES = [
  "CC(=O)Oc1ccccc1C(=O)O",
  "CC(C)Cc1ccc(cc1)C(C)C(=O)O",
  "Cn1cnc2c1c(=O)n(C)c(=O)n2C",
  "N[C@@H](Cc1c[nH]c2ccccc12)C(=O)O",
  "Cc1cc(NS(=O)(=O)c2ccc(N)cc2)no1",
  "CN1CCC[C@H]1c1cccnc1",
  "CC1(C)S[C@@H]2[C@H](NC(=O)Cc3ccccc3)C(=O)N2[C@H]1C(=O)O",
  "COc1ccc2[nH]cc(CCNC(C)=O)c2c1",
  "CN1CC[C@]23c4c5ccc(O)c4O[C@H]2[C@@H](O)C=C[C@H]3[C@H]1C5",
  "Clc1ccc2c(c1)C(=NCc1nncn1-2)c1ccccc1F",
  "CCN(CC)CCNC(=O)c1ccc(N)cc1",
  "[NH3+][C@@H](CCC(=O)[O-])C(=O)[O-].[Na+]",
];
const inputs = Array.from({ length: 100_000 }, (_, index) => MOLECULES[index % MOLECULES.length]);

function perSecond(work) {
  for (const text of inputs.slice(0, 10_000)) work(text); // warm the JIT
  const start = process.hrtime.bigint();
  for (const text of inputs) work(text);
  return (inputs.length / Number(process.hrtime.bigint() - start)) * 1e9;
}

const missed = [];
const report = (label, value, unit, aim, met) => {
  if (!met) missed.push(label);
  console.log(
    `${label.padEnd(28)} ${Math.round(value).toLocaleString("en-US").padStart(9)} ${unit}   aim ${aim}   ${met ? "meets aim" : "MISSES aim"}`,
  );
};

const read = perSecond((text) => parseSmiles(text));
report("read", read, "/s", `>= ${AIM_READ_PER_SECOND.toLocaleString("en-US")} /s`, read >= AIM_READ_PER_SECOND);
const full = perSecond((text) => {
  const result = kekulize(parseSmiles(text));
  if (result.ok) smilesFormula(result.value);
});
report("read + Kekulé + formula", full, "/s", `>= ${AIM_FULL_PER_SECOND.toLocaleString("en-US")} /s`, full >= AIM_FULL_PER_SECOND);
const chain = "C".repeat(200_000);
const start = process.hrtime.bigint();
parseSmiles(chain);
const chainMilliseconds = Number(process.hrtime.bigint() - start) / 1e6;
report(
  "200,000-atom chain",
  chainMilliseconds,
  "ms",
  `< ${AIM_LONG_CHAIN_MILLISECONDS} ms`,
  chainMilliseconds < AIM_LONG_CHAIN_MILLISECONDS,
);

if (strict && missed.length > 0) process.exit(1);
