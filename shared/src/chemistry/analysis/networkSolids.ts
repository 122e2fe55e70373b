/**
 * Network solids: one covalent lattice, no molecules. SiO2 is drawn as O=Si=O only as the gas-phase
 * monomer, with a note; for BN and SiC no molecule is worth drawing, so they get a plain refusal
 * that says what each atom's surroundings are in the solid.
 */
import type { FormulaPart, Problem, SpeciesReading } from "../types";
import { compositionKey } from "../vsepr/measuredAngles";

interface NetworkSolid {
  /** What the solid is and each atom's surroundings in it. */
  readonly note: string;
  /** The monomer drawn from the formula is a real gas-phase species worth showing. */
  readonly monomerShown: boolean;
}

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (silica, boron nitride and
// silicon carbide structures)
const NETWORK_SOLIDS: Readonly<Record<string, NetworkSolid>> = {
  O2Si: {
    note:
      "As a solid (quartz, sand, glass) SiO2 is a network solid: each Si is bonded to four O in a tetrahedron and each O " +
      "bridges two Si atoms (Si-O-Si bent), with no SiO2 molecules. The O=Si=O shape shown is the gas-phase monomer only.",
    monomerShown: true,
  },
  BN: {
    note:
      "BN (boron nitride) is a network solid with no BN molecules: in hexagonal BN every B and N is trigonal planar " +
      "in flat layers, as carbon in graphite; in cubic BN every atom is tetrahedral, as carbon in diamond.",
    monomerShown: false,
  },
  CSi: {
    note:
      "SiC (silicon carbide) is a network solid with no SiC molecules: every Si is bonded tetrahedrally to four C and " +
      "every C to four Si, as in diamond.",
    monomerShown: false,
  },
};

// from memory: Greenwood & Earnshaw, Chemistry of the Elements (allotropes of carbon)
const NETWORK_ELEMENTS: Readonly<Record<string, string>> = {
  diamond:
    "Diamond is a network solid of carbon: every C is bonded to four others in a tetrahedron (sp3, 109.5 degrees), " + "with no molecules.",
  graphite:
    "Graphite is a network solid of carbon: every C is bonded to three others in flat hexagonal layers (trigonal " +
    "planar, sp2, 120 degrees), with no molecules.",
};

function solidFor(composition: readonly FormulaPart[], charge: number): NetworkSolid | undefined {
  return charge === 0 ? NETWORK_SOLIDS[compositionKey(composition, 0)] : undefined;
}

/** The refusal for a network solid with no molecule worth drawing; undefined otherwise. */
export function networkSolidProblem(reading: SpeciesReading): Problem | undefined {
  if (reading.parts !== undefined) return undefined;
  const byName = reading.name === undefined ? undefined : NETWORK_ELEMENTS[reading.name.toLowerCase()];
  if (byName !== undefined && reading.notation === "name")
    return { code: "network-solid", message: `${byName} VSEPR describes each atom's surroundings, not a molecular shape.` };
  const solid = solidFor(reading.composition, reading.charge);
  if (solid === undefined || solid.monomerShown) return undefined;
  return { code: "network-solid", message: `${solid.note} VSEPR describes each atom's surroundings, not a molecular shape.` };
}

/** The note for a formula analysed as a gas-phase monomer of a network solid (SiO2); undefined otherwise. */
export function networkMonomerNote(reading: SpeciesReading): string | undefined {
  const solid = solidFor(reading.composition, reading.charge);
  return solid?.monomerShown && reading.parts === undefined ? solid.note : undefined;
}
