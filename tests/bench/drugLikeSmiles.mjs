// Deterministic drug-sized SMILES (20-60 heavy atoms) for benchmarks, assembled from fragments:
// aromatic and heteroaromatic rings, saturated rings, chains, amides, esters, sulfonamides,
// ethers, amines, halogens and nitriles. Each fragment closes its own rings, so ring-closure
// digits can be reused, and joins the next by a single bond from its last atom outside branches.

// The same seeded generator as the random strings, so every run builds the same molecules.
import { seededRandom } from "./randomStrings.mjs";

// head/tail: does the fragment start/end on a heteroatom (N, O, S, halogen)? Two heteroatoms are
// joined only through a sulfonyl group, so no peroxides or hydrazines creep in.
const fragment = (smiles, head, tail) => ({ smiles, head, tail, heavyAtoms: countHeavyAtoms(smiles) });
const C = "C";
const X = "X";

const STARTS = [
  fragment("C", C, C),
  fragment("CC", C, C),
  fragment("F", X, X),
  fragment("Cl", X, X),
  fragment("O", X, X),
  fragment("N", X, X),
  fragment("N#C", C, C),
  fragment("FC(F)(F)", X, C),
  fragment("CC(C)(C)", C, C),
  fragment("c1ccccc1", C, C),
  fragment("COc1ccc(cc1)", C, C),
  fragment("CN(C)", C, X),
  fragment("Clc1ccc(cc1)", X, C),
  fragment("CC(=O)N", C, X),
];

const LINKERS = [
  fragment("C", C, C),
  fragment("CC", C, C),
  fragment("CCC", C, C),
  fragment("C(C)", C, C),
  fragment("C(O)", C, C),
  fragment("C(F)(F)", C, C),
  fragment("C=C", C, C),
  fragment("C#C", C, C),
  fragment("C(=O)", C, C),
  fragment("C(=O)N", C, X),
  fragment("NC(=O)", X, C),
  fragment("C(=O)O", C, X),
  fragment("OC(=O)", X, C),
  fragment("O", X, X),
  fragment("N", X, X),
  fragment("N(C)", X, X),
  fragment("S", X, X),
  fragment("S(=O)(=O)", "S", "S"),
  fragment("S(=O)(=O)N", "S", X),
  fragment("NS(=O)(=O)", X, "S"),
  fragment("c1ccc(cc1)", C, C),
  fragment("c1cc(ccc1F)", C, C),
  fragment("c1ccc(nc1)", C, C),
  fragment("c1cnc(nc1)", C, C),
  fragment("c1ccc(s1)", C, C),
  fragment("c1ccc(o1)", C, C),
  fragment("c1nc(cs1)", C, C),
  fragment("c1ccc([nH]1)", C, C),
  fragment("c1ccc2cc(ccc2c1)", C, C),
  fragment("c1ccc2[nH]c(cc2c1)", C, C),
  fragment("c1nnc(o1)", C, C),
  fragment("C1CCC(CC1)", C, C),
  fragment("N1CCN(CC1)", X, X),
  fragment("C1CCN(CC1)", C, X),
  fragment("C1(CC1)", C, C),
  fragment("C1CCOC(C1)", C, C),
  fragment("C(=O)NC", C, C),
  fragment("CC(=O)OC", C, C),
];

const ENDS = [
  fragment("C", C, C),
  fragment("F", X, X),
  fragment("Cl", X, X),
  fragment("Br", X, X),
  fragment("O", X, X),
  fragment("N", X, X),
  fragment("C#N", C, C),
  fragment("C(F)(F)F", C, C),
  fragment("c1ccccc1", C, C),
  fragment("C(=O)O", C, C),
  fragment("C(=O)N", C, C),
  fragment("S(N)(=O)=O", "S", "S"),
  fragment("[N+](=O)[O-]", X, X),
  fragment("C(C)(C)C", C, C),
  fragment("OC", X, C),
  fragment("c1ccncc1", C, C),
  fragment("C1CC1", C, C),
  fragment("N1CCOCC1", X, X),
  fragment("c1ccc(O)c(O)c1", C, C),
];

function countHeavyAtoms(smiles) {
  return (smiles.match(/\[[^\]]+\]|Cl|Br|[BCNOSPFI]|[bcnosp]/g) ?? []).length;
}

const joins = (tail, head) => !(tail === X && head === X);

function pick(random, list, previousTail) {
  for (;;) {
    const candidate = list[Math.floor(random() * list.length)];
    if (previousTail === undefined || joins(previousTail, candidate.head)) return candidate;
  }
}

/** One molecule with a heavy-atom count in [min, max], or undefined when the draw overshoots. */
function oneMolecule(random, min, max) {
  const target = min + Math.floor(random() * (max - min + 1));
  const start = pick(random, STARTS);
  const parts = [start.smiles];
  let heavyAtoms = start.heavyAtoms;
  let tail = start.tail;
  while (heavyAtoms < target - 3) {
    const linker = pick(random, LINKERS, tail);
    parts.push(linker.smiles);
    heavyAtoms += linker.heavyAtoms;
    tail = linker.tail;
  }
  const end = pick(random, ENDS, tail);
  parts.push(end.smiles);
  heavyAtoms += end.heavyAtoms;
  return heavyAtoms >= min && heavyAtoms <= max ? { smiles: parts.join(""), heavyAtoms } : undefined;
}

/**
 * `count` distinct SMILES with `min`..`max` heavy atoms (defaults 20..60), the same for a given
 * seed on every run.
 */
export function drugLikeSmiles(count, { seed = 20_260_401, min = 20, max = 60 } = {}) {
  const random = seededRandom(seed);
  const seen = new Set();
  const molecules = [];
  while (molecules.length < count) {
    const molecule = oneMolecule(random, min, max);
    if (molecule === undefined || seen.has(molecule.smiles)) continue;
    seen.add(molecule.smiles);
    molecules.push(molecule.smiles);
  }
  return molecules;
}

export { countHeavyAtoms };
