import type { Problem } from "../types";
import { findBridges } from "./bridges";
import { ELEMENT_SYMBOLS } from "./elementSymbols";
import { position, smilesProblem } from "./problems";
import { readBracketAtom } from "./readBracketAtom";
import type { SmilesAtom, SmilesBond, SmilesResult } from "./types";
import { implicitHydrogens } from "./valence";

export type { SmilesAtom, SmilesBond, SmilesMolecule, SmilesResult } from "./types";

// How a bond was written. DIRECTIONAL (/ or \) counts as an unwritten bond: stereo is dropped.
const BOND_UNWRITTEN = 0;
const BOND_SINGLE = 1;
const BOND_DOUBLE = 2;
const BOND_TRIPLE = 3;
const BOND_QUADRUPLE = 4;
const BOND_AROMATIC = 5;
const BOND_DIRECTIONAL = 6;

// What the reader has just seen, which decides what may come next.
const AFTER_NOTHING = 0;
const AFTER_ATOM = 1; // an atom or one of its ring-bond digits
const AFTER_OPEN = 2;
const AFTER_CLOSE = 3;
const AFTER_BOND = 4;
const AFTER_DOT = 5;

const RING_SLOTS = 100;

// Ring-bond slots, reused between calls (cleared at the start of each) because a fresh set per
// molecule is a measurable share of the time for short SMILES.
const ringAtom = new Int32Array(RING_SLOTS); // atom index + 1; 0 when the number is free
const ringKind = new Uint8Array(RING_SLOTS);
const ringOpening = new Int32Array(RING_SLOTS);

interface AtomRecord {
  symbol: string;
  aromatic: boolean;
  charge: number;
  hydrogens: number;
  isotope: number | undefined;
  bracket: boolean;
  range: { start: number; end: number };
}

interface BondRecord {
  from: number;
  to: number;
  order: 1 | 2 | 3 | 4;
  aromatic: boolean;
  direction?: "/" | "\\";
}

function failure(problem: Problem): SmilesResult {
  return { ok: false, problem };
}

function bondKindOf(code: number): number {
  switch (code) {
    case 45:
      return BOND_SINGLE; // -
    case 61:
      return BOND_DOUBLE; // =
    case 35:
      return BOND_TRIPLE; // #
    case 36:
      return BOND_QUADRUPLE; // $
    case 58:
      return BOND_AROMATIC; // :
    case 47: // /
    case 92:
      return BOND_DIRECTIONAL; // \
    default:
      return -1;
  }
}

/** Ring-bond kinds agree when equal or when either side leaves the bond unwritten. */
function ringKindsAgree(opening: number, closing: number): boolean {
  const a = opening === BOND_DIRECTIONAL ? BOND_UNWRITTEN : opening;
  const b = closing === BOND_DIRECTIONAL ? BOND_UNWRITTEN : closing;
  return a === BOND_UNWRITTEN || b === BOND_UNWRITTEN || a === b;
}

/**
 * Reads a SMILES string (the OpenSMILES constitution subset) into atoms and bonds.
 *
 * - Organic-subset atoms get implicit hydrogens from the standard valence rules; bracket atoms
 *   carry exactly the hydrogens written.
 * - A bond between two aromatic atoms that is written `:` or left unwritten is aromatic, with
 *   order 1, when it lies on a ring; an unwritten one on no ring (the bond joining the rings of
 *   biphenyl) is an ordinary single bond.
 * - `/` and `\` are read as single bonds, and stereo marks (@, @@, @TH1, ...) and atom classes
 *   are accepted and dropped.
 *
 * Runs in time linear in the length of the text and never throws: bad input gives
 * `{ ok: false, problem }` with a range at the offending characters.
 */
export function parseSmiles(text: string): SmilesResult {
  const length = text.length;
  if (length === 0) return failure(smilesProblem("empty-input", "The SMILES string is empty.", 0, 0));

  const atoms: AtomRecord[] = [];
  const bonds: BondRecord[] = [];
  const bondOrderSums: number[] = [];
  // Bonds made after an atom was created all involve that atom while its ring digits are read.
  const firstBondOfAtom: number[] = [];
  let chainAromaticBonds: number[] | undefined;
  const branchAtoms: number[] = [];
  const branchOpenings: number[] = [];
  ringAtom.fill(0);
  let openRings = 0;

  let previous = -1;
  let state = AFTER_NOTHING;
  let bondKind = BOND_UNWRITTEN;
  // "/" or "\" as written before the next atom: kept on chain bonds for double-bond geometry.
  let bondDirection: "/" | "\\" | undefined;
  let bondStart = -1;
  let bondFollowsAtom = false;

  const addBond = (from: number, to: number, kind: number, onChain: boolean, direction?: "/" | "\\"): void => {
    let order: 1 | 2 | 3 | 4 = 1;
    let aromatic = false;
    if (kind === BOND_UNWRITTEN || kind === BOND_DIRECTIONAL) {
      aromatic = atoms[from].aromatic && atoms[to].aromatic;
      if (aromatic && onChain) (chainAromaticBonds ??= []).push(bonds.length);
    } else if (kind === BOND_AROMATIC) {
      aromatic = true;
    } else {
      order = kind as 1 | 2 | 3 | 4;
    }
    bonds.push(direction ? { from, to, order, aromatic, direction } : { from, to, order, aromatic });
    bondOrderSums[from] += order;
    bondOrderSums[to] += order;
  };

  const addAtom = (atom: AtomRecord): void => {
    const index = atoms.length;
    atoms.push(atom);
    bondOrderSums.push(0);
    firstBondOfAtom.push(bonds.length);
    if (previous >= 0) addBond(previous, index, bondKind, true, bondDirection);
    previous = index;
    bondKind = BOND_UNWRITTEN;
    bondDirection = undefined;
    state = AFTER_ATOM;
  };

  const addOrganicAtom = (symbol: string, aromatic: boolean, start: number, end: number): void => {
    addAtom({ symbol, aromatic, charge: 0, hydrogens: -1, isotope: undefined, bracket: false, range: { start, end } });
  };

  let i = 0;
  while (i < length) {
    const code = text.charCodeAt(i);
    const next = i + 1 < length ? text.charCodeAt(i + 1) : 0;
    switch (code) {
      case 66: // B, Br
        if (next === 114) {
          addOrganicAtom("Br", false, i, i + 2);
          i += 2;
        } else {
          addOrganicAtom("B", false, i, i + 1);
          i++;
        }
        continue;
      case 67: // C, Cl
        if (next === 108) {
          addOrganicAtom("Cl", false, i, i + 2);
          i += 2;
        } else {
          addOrganicAtom("C", false, i, i + 1);
          i++;
        }
        continue;
      case 78:
        addOrganicAtom("N", false, i, i + 1);
        i++;
        continue;
      case 79:
        addOrganicAtom("O", false, i, i + 1);
        i++;
        continue;
      case 80:
        addOrganicAtom("P", false, i, i + 1);
        i++;
        continue;
      case 83:
        addOrganicAtom("S", false, i, i + 1);
        i++;
        continue;
      case 70:
        addOrganicAtom("F", false, i, i + 1);
        i++;
        continue;
      case 73:
        addOrganicAtom("I", false, i, i + 1);
        i++;
        continue;
      case 98:
        addOrganicAtom("B", true, i, i + 1);
        i++;
        continue;
      case 99:
        addOrganicAtom("C", true, i, i + 1);
        i++;
        continue;
      case 110:
        addOrganicAtom("N", true, i, i + 1);
        i++;
        continue;
      case 111:
        addOrganicAtom("O", true, i, i + 1);
        i++;
        continue;
      case 112:
        addOrganicAtom("P", true, i, i + 1);
        i++;
        continue;
      case 115:
        addOrganicAtom("S", true, i, i + 1);
        i++;
        continue;
      case 91: {
        // [
        const bracket = readBracketAtom(text, i);
        if ("code" in bracket) return failure(bracket);
        addAtom({
          symbol: bracket.symbol,
          aromatic: bracket.aromatic,
          charge: bracket.charge,
          hydrogens: bracket.hydrogens,
          isotope: bracket.isotope,
          bracket: true,
          range: { start: i, end: bracket.end },
        });
        i = bracket.end;
        continue;
      }
      case 40: // (
        if (state !== AFTER_ATOM && state !== AFTER_CLOSE) return failure(misplaced(text, i, "a branch must follow an atom"));
        branchAtoms.push(previous);
        branchOpenings.push(i);
        state = AFTER_OPEN;
        i++;
        continue;
      case 41: // )
        if (branchAtoms.length === 0) {
          return failure(smilesProblem("unbalanced-brackets", `The ")" at ${position(i)} closes no "(".`, i, i + 1));
        }
        if (state !== AFTER_ATOM && state !== AFTER_CLOSE) return failure(misplaced(text, i, "a branch must end with an atom"));
        previous = branchAtoms.pop()!;
        branchOpenings.pop();
        state = AFTER_CLOSE;
        i++;
        continue;
      case 46: // .
        if (state !== AFTER_ATOM && state !== AFTER_CLOSE) return failure(misplaced(text, i, "a dot must follow an atom"));
        previous = -1;
        state = AFTER_DOT;
        i++;
        continue;
      case 37: // %nn
      case 48:
      case 49:
      case 50:
      case 51:
      case 52:
      case 53:
      case 54:
      case 55:
      case 56:
      case 57: {
        const digitStart = i;
        let ringNumber: number;
        if (code === 37) {
          const third = i + 2 < length ? text.charCodeAt(i + 2) : 0;
          if (next < 48 || next > 57 || third < 48 || third > 57) {
            return failure(
              smilesProblem(
                "malformed-formula",
                `"%" at ${position(i)} must be followed by two digits, as in %10.`,
                i,
                Math.min(i + 3, length),
              ),
            );
          }
          ringNumber = (next - 48) * 10 + (third - 48);
          i += 3;
        } else {
          ringNumber = code - 48;
          i++;
        }
        if (state !== AFTER_ATOM && !(state === AFTER_BOND && bondFollowsAtom)) {
          return failure(misplaced(text, digitStart, "a ring-bond number must directly follow an atom"));
        }
        const partner = ringAtom[ringNumber] - 1;
        if (partner < 0) {
          ringAtom[ringNumber] = previous + 1;
          ringKind[ringNumber] = bondKind;
          ringOpening[ringNumber] = digitStart;
          openRings++;
        } else {
          const label = text.slice(digitStart, i);
          if (partner === previous) {
            return failure(
              smilesProblem(
                "malformed-formula",
                `Ring bond ${label} at ${position(digitStart)} would bond an atom to itself.`,
                digitStart,
                i,
              ),
            );
          }
          if (!ringKindsAgree(ringKind[ringNumber], bondKind)) {
            return failure(
              smilesProblem(
                "malformed-formula",
                `Ring bond ${label} is written with two different bond symbols (${position(ringOpening[ringNumber])} and ${position(bondStart)}).`,
                bondStart,
                i,
              ),
            );
          }
          for (let b = firstBondOfAtom[previous]; b < bonds.length; b++) {
            const bond = bonds[b];
            if (bond.from === partner || bond.to === partner) {
              return failure(
                smilesProblem(
                  "malformed-formula",
                  `Ring bond ${label} at ${position(digitStart)} repeats a bond that is already there.`,
                  digitStart,
                  i,
                ),
              );
            }
          }
          addBond(partner, previous, bondKind === BOND_UNWRITTEN ? ringKind[ringNumber] : bondKind, false);
          ringAtom[ringNumber] = 0;
          openRings--;
        }
        bondKind = BOND_UNWRITTEN;
        bondDirection = undefined;
        state = AFTER_ATOM;
        continue;
      }
      default: {
        const kind = bondKindOf(code);
        if (kind >= 0) {
          if (state !== AFTER_ATOM && state !== AFTER_CLOSE && state !== AFTER_OPEN) {
            return failure(misplaced(text, i, "a bond symbol must sit between two atoms"));
          }
          bondFollowsAtom = state === AFTER_ATOM;
          bondKind = kind;
          bondDirection = code === 47 ? "/" : code === 92 ? "\\" : undefined;
          bondStart = i;
          state = AFTER_BOND;
          i++;
          continue;
        }
        return failure(unexpectedCharacter(text, i));
      }
    }
  }

  if (branchAtoms.length > 0) {
    const opening = branchOpenings[branchOpenings.length - 1];
    return failure(smilesProblem("unbalanced-brackets", `The "(" at ${position(opening)} is never closed with ")".`, opening, opening + 1));
  }
  if (state === AFTER_BOND) {
    return failure(
      smilesProblem(
        "malformed-formula",
        `The bond "${text[bondStart]}" at ${position(bondStart)} has no atom after it.`,
        bondStart,
        bondStart + 1,
      ),
    );
  }
  if (state === AFTER_DOT) {
    return failure(smilesProblem("malformed-formula", `The "." at ${position(length - 1)} has no atom after it.`, length - 1, length));
  }
  if (openRings > 0) {
    let first = -1;
    for (let n = 0; n < RING_SLOTS; n++) {
      if (ringAtom[n] !== 0 && (first < 0 || ringOpening[n] < ringOpening[first])) first = n;
    }
    const start = ringOpening[first];
    const end = text.charCodeAt(start) === 37 ? start + 3 : start + 1;
    return failure(
      smilesProblem("malformed-formula", `Ring bond ${text.slice(start, end)} opened at ${position(start)} is never closed.`, start, end),
    );
  }

  if (chainAromaticBonds !== undefined) {
    // Aromaticity lives on rings: an unwritten bond between two aromatic atoms off every ring is single.
    const bridge = findBridges(atoms.length, bonds);
    for (const b of chainAromaticBonds) if (bridge[b] === 1) bonds[b].aromatic = false;
  }
  for (let a = 0; a < atoms.length; a++) {
    const atom = atoms[a];
    if (!atom.bracket) atom.hydrogens = implicitHydrogens(atom.symbol, atom.aromatic, bondOrderSums[a]);
  }
  return { ok: true, value: { atoms: atoms as SmilesAtom[], bonds: bonds as SmilesBond[] } };
}

function misplaced(text: string, offset: number, rule: string): Problem {
  return smilesProblem("malformed-formula", `Unexpected "${text[offset]}" at ${position(offset)}: ${rule}.`, offset, offset + 1);
}

function unexpectedCharacter(text: string, offset: number): Problem {
  const code = text.charCodeAt(offset);
  if (code >= 65 && code <= 90) {
    const pair = text.slice(offset, offset + 2);
    const symbol = ELEMENT_SYMBOLS.has(pair) ? pair : ELEMENT_SYMBOLS.has(text[offset]) ? text[offset] : undefined;
    if (symbol !== undefined) {
      return {
        code: "malformed-formula",
        message: `${symbol} at ${position(offset)} is outside the organic subset and must be written in brackets, as [${symbol}].`,
        suggestion: `[${symbol}]`,
        range: { start: offset, end: offset + symbol.length },
      };
    }
  }
  if ((code >= 65 && code <= 90) || (code >= 97 && code <= 122)) {
    return smilesProblem(
      "unknown-element",
      `"${text[offset]}" at ${position(offset)} is not an element symbol that SMILES allows here.`,
      offset,
      offset + 1,
    );
  }
  if (code === 93) {
    return smilesProblem("unbalanced-brackets", `The "]" at ${position(offset)} closes no "[".`, offset, offset + 1);
  }
  const shown = code === 32 ? "a space" : code < 32 || code === 127 ? "a control character" : `"${text[offset]}"`;
  return smilesProblem("malformed-formula", `Unexpected ${shown} at ${position(offset)} in SMILES.`, offset, offset + 1);
}
