import type { SmilesAtom, SmilesBond, SmilesMolecule } from "./types";
import { implicitHydrogens, isOrganicSubset } from "./valence";

const BOND_SYMBOLS = ["", "", "=", "#", "$"] as const;

/**
 * Writes a molecule back as SMILES. Pass the output of `kekulize` for a Kekulé SMILES.
 *
 * Atoms of the organic subset are written bare when their hydrogens are exactly what the
 * valence rules imply; every other atom goes in brackets with its hydrogens, charge and mass
 * number. Hydrogens are never written as separate atoms unless the molecule holds [H] atoms.
 * Stereo is not written (the reader drops it). Parts are joined with ".".
 */
export function writeSmiles(value: SmilesMolecule): string {
  const { atoms, bonds } = value;
  const atomCount = atoms.length;
  const offsets = new Int32Array(atomCount + 1);
  for (const bond of bonds) {
    offsets[bond.from + 1]++;
    offsets[bond.to + 1]++;
  }
  for (let a = 0; a < atomCount; a++) offsets[a + 1] += offsets[a];
  const incident = new Int32Array(offsets[atomCount]);
  const fill = offsets.slice(0, atomCount);
  const bondOrderSums = new Int32Array(atomCount);
  for (let b = 0; b < bonds.length; b++) {
    const { from, to, order } = bonds[b];
    incident[fill[from]++] = b;
    incident[fill[to]++] = b;
    bondOrderSums[from] += order;
    bondOrderSums[to] += order;
  }
  const other = (b: number, atom: number): number => (bonds[b].from === atom ? bonds[b].to : bonds[b].from);

  // Depth-first spanning forest: tree bonds become the chain and branches, the rest ring bonds.
  const visited = new Uint8Array(atomCount);
  const treeBond = new Uint8Array(bonds.length);
  const parentBond = new Int32Array(atomCount).fill(-1);
  const children: number[][] = Array.from({ length: atomCount }, () => []);
  const roots: number[] = [];
  const nextEdge = new Int32Array(atomCount);
  const stack: number[] = [];
  for (let root = 0; root < atomCount; root++) {
    if (visited[root]) continue;
    roots.push(root);
    visited[root] = 1;
    nextEdge[root] = offsets[root];
    stack.push(root);
    while (stack.length > 0) {
      const atom = stack[stack.length - 1];
      if (nextEdge[atom] === offsets[atom + 1]) {
        stack.pop();
        continue;
      }
      const b = incident[nextEdge[atom]++];
      const neighbour = other(b, atom);
      if (visited[neighbour]) continue;
      visited[neighbour] = 1;
      treeBond[b] = 1;
      parentBond[neighbour] = b;
      children[atom].push(neighbour);
      nextEdge[neighbour] = offsets[neighbour];
      stack.push(neighbour);
    }
  }

  // Ring-bond numbers are handed out in writing order and reused once closed.
  const ringNumberOfBond = new Int32Array(bonds.length).fill(-1);
  const numbersInUse: boolean[] = [];
  const written = new Uint8Array(atomCount);
  const out: string[] = [];
  // Work items: an atom index to write, or a literal "(" / ")".
  const work: (number | string)[] = [];
  for (let r = 0; r < roots.length; r++) {
    if (r > 0) out.push(".");
    work.push(roots[r]);
    while (work.length > 0) {
      const item = work.pop()!;
      if (typeof item === "string") {
        out.push(item);
        continue;
      }
      const atom = item;
      if (parentBond[atom] >= 0) out.push(bondSymbol(bonds[parentBond[atom]], atoms));
      out.push(atomText(atoms[atom], bondOrderSums[atom]));
      written[atom] = 1;
      for (let e = offsets[atom]; e < offsets[atom + 1]; e++) {
        const b = incident[e];
        if (treeBond[b]) continue;
        if (ringNumberOfBond[b] >= 0) {
          const number = ringNumberOfBond[b];
          out.push(ringLabel(number));
          numbersInUse[number] = false;
        } else if (!written[other(b, atom)]) {
          let number = 1;
          while (numbersInUse[number]) number++;
          numbersInUse[number] = true;
          ringNumberOfBond[b] = number;
          out.push(bondSymbol(bonds[b], atoms), ringLabel(number));
        }
      }
      const kids = children[atom];
      if (kids.length > 0) {
        work.push(kids[kids.length - 1]);
        for (let k = kids.length - 2; k >= 0; k--) work.push(")", kids[k], "(");
      }
    }
  }
  return out.join("");
}

function ringLabel(number: number): string {
  if (number < 10) return String(number);
  if (number < 100) return `%${number}`;
  return `%(${number})`;
}

function bondSymbol(bond: SmilesBond, atoms: readonly SmilesAtom[]): string {
  const bothAromatic = atoms[bond.from].aromatic && atoms[bond.to].aromatic;
  if (bond.aromatic) return bothAromatic ? "" : ":";
  if (bond.order === 1) return bothAromatic ? "-" : "";
  return BOND_SYMBOLS[bond.order];
}

function atomText(atom: SmilesAtom, bondOrderSum: number): string {
  const symbol = atom.aromatic ? atom.symbol.toLowerCase() : atom.symbol;
  const bare =
    atom.charge === 0 &&
    atom.isotope === undefined &&
    isOrganicSubset(atom.symbol) &&
    // The reader applies the same rule, so a bare atom reads back with the same hydrogens.
    implicitHydrogens(atom.symbol, atom.aromatic, bondOrderSum) === atom.hydrogens;
  if (bare) return symbol;
  const parts = ["["];
  if (atom.isotope !== undefined) parts.push(String(atom.isotope));
  parts.push(symbol);
  if (atom.hydrogens > 0) parts.push(atom.hydrogens === 1 ? "H" : `H${atom.hydrogens}`);
  if (atom.charge !== 0) {
    const sign = atom.charge > 0 ? "+" : "-";
    parts.push(Math.abs(atom.charge) === 1 ? sign : `${sign}${Math.abs(atom.charge)}`);
  }
  parts.push("]");
  return parts.join("");
}
