/**
 * Try every reasonable skeleton for a molecular formula and keep the Lewis structure with the
 * best formal charges; when none works, say why in the chemist's terms.
 */
import { elementBySymbol } from "../elements";
import {
  type CandidateSkeleton,
  candidateSkeletons,
  countChainFormingAtoms,
  expandComposition,
  isChainFormingAtom,
} from "../lewis/candidateSkeletons";
import {
  chooseLewisStructure,
  compareScores,
  countValenceElectrons,
  type LewisFailure,
  type LewisScore,
  type LewisStructure,
} from "../lewis/chooseLewisStructure";
import type { Problem, SpeciesReading } from "../types";
import { condensedSkeletons, looksCondensed } from "./condensedFormula";

export type ChosenStructure =
  | {
      readonly ok: true;
      readonly structure: LewisStructure;
      readonly centre: number | undefined;
      /** The atoms are bonded in the order written (HCNO is H-C-N-O), not as formal charges alone would have them. */
      readonly asWritten?: boolean;
    }
  | { readonly ok: false; readonly problem: Problem };

/** Species this large are written as molecules, not as one centre and its neighbours. */
const MAX_ATOMS = 40;

export function chooseSkeletonStructure(reading: SpeciesReading): ChosenStructure {
  const symbols = expandComposition(reading.composition);
  const { formula, charge } = reading;
  const electrons = countValenceElectrons(symbols, charge);
  if (electrons < 0) {
    return fail(
      "too-few-electrons",
      `${formula}: a charge of ${charge} removes more electrons than its atoms have (${electrons + charge} valence electrons).`,
    );
  }
  if (symbols.length > MAX_ATOMS) {
    return fail(
      "ambiguous-connectivity",
      `${formula} has ${symbols.length} atoms: write it as a structural formula or SMILES so its connectivity is clear.`,
    );
  }
  if (symbols.length === 1) {
    return { ok: true, structure: monatomic(symbols, charge, electrons), centre: undefined };
  }
  if (symbols.length === 2) {
    const outcome = chooseLewisStructure({ symbols, bonds: [[0, 1]] }, charge);
    if (outcome.ok) return { ok: true, structure: outcome.structure, centre: undefined };
    return explainFailure(reading, symbols, outcome.failure, outcome.atom);
  }
  if (symbols.every((symbol) => symbol === "H")) {
    return fail(
      "hydrogen-overbonded",
      `${formula}: a hydrogen atom can form only one bond, so ${symbols.length} hydrogens cannot share a centre.`,
    );
  }

  if (looksCondensed(reading.writtenSequence)) {
    const fromCondensed = chooseCondensedStructure(reading);
    if (fromCondensed) return fromCondensed;
  }

  let best: RankedSkeleton | undefined;
  let firstFailure: { failure: LewisFailure; atom?: number } | undefined;
  const candidates = candidateSkeletons(symbols);
  if (candidates.length === 0) {
    return symbols.includes("H")
      ? fail("hydrogen-overbonded", `${formula}: only hydrogen could sit in the middle, and hydrogen forms just one bond.`)
      : fail("no-central-atom", `${formula}: fluorine forms only one bond, so none of these atoms can hold the others together.`);
  }
  for (const skeleton of candidates) {
    const outcome = chooseLewisStructure(skeleton, charge);
    if (!outcome.ok) {
      firstFailure ??= { failure: outcome.failure, atom: outcome.atom };
      continue;
    }
    const centreSymbol = symbols[skeleton.centre];
    const ranked: RankedSkeleton = {
      structure: outcome.structure,
      centre: skeleton.centre,
      centreIsUnique: reading.composition.find((part) => part.symbol === centreSymbol)?.count === 1,
      electronegativity: elementBySymbol(centreSymbol)!.electronegativity ?? 4.5,
      isPair: skeleton.pair === true,
    };
    if (!best || compareSkeletons(ranked, best) < 0) best = ranked;
  }

  const written = writtenChainStructure(reading, symbols, best);
  if (written) return written;

  const chainAtoms = countChainFormingAtoms(symbols);
  if (best) {
    const outerTroubled = best.structure.graph.atoms.some((atom, index) => index !== best!.centre && Math.abs(atom.formalCharge) >= 2);
    // A star that leaves atoms short of an octet, or outer atoms heavily charged, means the
    // real molecule is a chain: C2H2 is HCCH, not H2C=C.
    if (chainAtoms >= 2 && (best.structure.score.shellDeficit > 0 || outerTroubled)) {
      return needsStructure(reading);
    }
    return { ok: true, structure: best.structure, centre: best.centre };
  }
  if (chainAtoms >= 2) return needsStructure(reading);
  return explainFailure(reading, symbols, firstFailure?.failure ?? "no-structure", firstFailure?.atom);
}

/**
 * The best skeleton a condensed structural formula allows; undefined when the text is not a
 * condensed formula this reader understands (the molecular-formula path then has its say).
 */
function chooseCondensedStructure(reading: SpeciesReading): ChosenStructure | undefined {
  const skeletons = condensedSkeletons(reading.formula);
  if (!skeletons || skeletons.length === 0) return undefined;
  let best: { structure: LewisStructure; centre: number; peroxideBonds: number } | undefined;
  for (const skeleton of skeletons) {
    const outcome = chooseLewisStructure(skeleton, reading.charge);
    if (!outcome.ok) continue;
    // Skeletons arrive with the most recent parent first, so a tie on formal charges keeps the
    // chain as written, expanded octet or not (OClO is O-Cl-O, not Cl-O-O); but an O-O bond is
    // written on purpose (HOOH), so a tie never invents one: HOOCCOOH is oxalic acid, not a
    // diperoxide.
    const order = best ? compareFormalCharges(outcome.structure.score, best.structure.score) : -1;
    if (order > 0) continue;
    const peroxideBonds = countOxygenOxygenBonds(skeleton);
    if (!best || order < 0 || peroxideBonds < best.peroxideBonds) {
      best = { structure: outcome.structure, centre: skeleton.centre, peroxideBonds };
    }
  }
  if (!best) return undefined;
  if (best.structure.score.shellDeficit > 0) {
    return fail(
      "no-valid-structure",
      `${reading.formula}: as written, some atom is left without a full octet; check the structural formula.`,
    );
  }
  return { ok: true, structure: best.structure, centre: best.centre };
}

/**
 * A formula spelled one atom at a time (HCNO, FNO, NSF, HOCl) names its atoms in bonded order,
 * and a chemist reads it so even where another skeleton has smaller formal charges: HCNO is
 * fulminic acid, H-C≡N⁺-O⁻, not isocyanic acid. Three readings are left to the formal charges:
 * the centre written first with its ligands after it (NOCl is O=N-Cl, COS is O=C=S); an H or
 * halogen in the middle of the chain (HClO is the oxyacid HOCl; CHBrClF is a Hill formula); and
 * a chain that needs an atom charged beyond ±1, leaves an octet the best skeleton fills short, or
 * costs more than one pair of opposite formal charges over it.
 */
function writtenChainStructure(
  reading: SpeciesReading,
  symbols: readonly string[],
  bestStar: RankedSkeleton | undefined,
): ChosenStructure | undefined {
  const sequence = reading.writtenSequence;
  if (symbols.length < 3 || sequence.length !== symbols.length) return undefined;
  for (let k = 0; k < sequence.length; k++) if (sequence[k].count !== 1 || sequence[k].symbol !== symbols[k]) return undefined;
  for (let k = 1; k < symbols.length - 1; k++) if (!isChainFormingAtom(symbols[k])) return undefined;
  if (bestStar && symbols[bestStar.centre] === symbols[0]) return undefined;
  const bonds: [number, number][] = [];
  for (let k = 1; k < symbols.length; k++) bonds.push([k - 1, k]);
  const outcome = chooseLewisStructure({ symbols, bonds }, reading.charge);
  if (!outcome.ok) return undefined;
  const { structure } = outcome;
  const score = structure.score;
  if (structure.graph.atoms.some((atom) => Math.abs(atom.formalCharge) > 1)) return undefined;
  if (score.shellDeficit > (bestStar?.structure.score.shellDeficit ?? 0)) return undefined;
  if (bestStar && score.sumAbsFormalCharge > bestStar.structure.score.sumAbsFormalCharge + 2) return undefined;
  return { ok: true, structure, centre: 1, asWritten: true };
}

/** Octets first, then formal charges: the checks that outrank the order a formula is written in. */
function compareFormalCharges(a: LewisScore, b: LewisScore): number {
  return (
    a.shellDeficit - b.shellDeficit || a.sumAbsFormalCharge - b.sumAbsFormalCharge || a.sumSquareFormalCharge - b.sumSquareFormalCharge
  );
}

function countOxygenOxygenBonds(skeleton: CandidateSkeleton): number {
  let count = 0;
  for (const [a, b] of skeleton.bonds) if (skeleton.symbols[a] === "O" && skeleton.symbols[b] === "O") count++;
  return count;
}

interface RankedSkeleton {
  readonly structure: LewisStructure;
  readonly centre: number;
  readonly centreIsUnique: boolean;
  readonly electronegativity: number;
  /** The X-A-A-X chain rather than a star. */
  readonly isPair: boolean;
}

/**
 * Formal charges first; when they tie, the skeleton whose centre is the one atom of its element
 * (Cl2O is Cl-O-Cl, ClO2 is O-Cl-O, FClO2 is F-Cl(=O)=O rather than F-O-O-Cl), then against an
 * X-A-A-X chain no needless expanded octet, then the less electronegative centre (NSF is N≡S-F),
 * then the remaining tie-breaks of the Lewis search.
 */
function compareSkeletons(a: RankedSkeleton, b: RankedSkeleton): number {
  const sa = a.structure.score;
  const sb = b.structure.score;
  return (
    sa.shellDeficit - sb.shellDeficit ||
    sa.sumAbsFormalCharge - sb.sumAbsFormalCharge ||
    sa.sumSquareFormalCharge - sb.sumSquareFormalCharge ||
    Number(b.centreIsUnique) - Number(a.centreIsUnique) ||
    // Against the X-A-A-X chain, no needless expanded octet: Cl-S-S-Cl, not S=SCl2; Cl-O-O-Cl,
    // not ClClO2. (Among stars the expanded octet may win: N≡S-F, O-Cl-O.)
    (a.isPair !== b.isPair ? sa.expandedAtoms - sb.expandedAtoms : 0) ||
    a.electronegativity - b.electronegativity ||
    compareScores(sa, sb)
  );
}

function explainFailure(
  reading: SpeciesReading,
  symbols: readonly string[],
  failure: LewisFailure,
  atom: number | undefined,
): ChosenStructure {
  const { formula, charge } = reading;
  switch (failure) {
    case "charge-exceeds-electrons":
      return fail("too-few-electrons", `${formula}: the charge ${charge} removes more electrons than its atoms have.`);
    case "too-few-electrons-to-bond": {
      const electrons = countValenceElectrons(symbols, charge);
      return fail(
        "too-few-electrons",
        `${formula} has ${electrons} valence electrons, too few to bond its ${symbols.length} atoms (at least ${2 * (symbols.length - 1)} needed).`,
      );
    }
    case "hydrogen-overbonded":
      return fail("hydrogen-overbonded", `${formula}: hydrogen would have to form more than one bond, and it holds only two electrons.`);
    case "shell-overflow":
    case "too-many-domains": {
      const element = atom !== undefined ? elementBySymbol(symbols[atom]) : undefined;
      if (element && element.period === 2) {
        return fail(
          "octet-exceeded",
          `${formula}: ${element.name} is in period 2 and can hold at most four electron pairs (an octet), but ${formula} would need more around it. Expanded octets start in period 3.`,
        );
      }
      if (element && element.symbol === "H") {
        return fail("hydrogen-overbonded", `${formula}: hydrogen would have to form more than one bond.`);
      }
      if (element && element.period === 1) {
        return fail(
          "octet-exceeded",
          `${formula}: ${element.name} holds at most two electrons (a full first shell), so it cannot bond here.`,
        );
      }
      const limit = element && element.period <= 4 ? "six" : "seven";
      return fail(
        "octet-exceeded",
        `${formula}: ${element?.name ?? "the central atom"} would need more electron domains than it can hold (at most ${limit} around an atom of period ${element?.period ?? "?"}).`,
      );
    }
    default:
      return fail("no-valid-structure", `${formula}: no Lewis structure fits these atoms and this electron count.`);
  }
}

function needsStructure(reading: SpeciesReading): ChosenStructure {
  return fail(
    "ambiguous-connectivity",
    `${reading.formula} has more than one atom that needs two or more bonds, so the formula alone does not say how the atoms connect. Write a structural formula (such as CH3CH2CH3) or a SMILES string.`,
  );
}

function monatomic(symbols: readonly string[], charge: number, electrons: number): LewisStructure {
  const pairs = Math.floor(electrons / 2);
  return {
    graph: {
      atoms: [{ symbol: symbols[0], lonePairs: pairs, unpairedElectrons: electrons % 2, formalCharge: charge }],
      bonds: [],
    },
    score: {
      shellDeficit: 0,
      sumAbsFormalCharge: Math.abs(charge),
      sumSquareFormalCharge: charge * charge,
      expandedAtoms: 0,
      chargeTimesElectronegativity: 0,
    },
    resonanceForms: 1,
    valenceElectrons: electrons,
  };
}

function fail(code: Problem["code"], message: string): ChosenStructure {
  return { ok: false, problem: { code, message } };
}
