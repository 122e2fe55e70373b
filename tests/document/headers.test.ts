/**
 * Column meanings from headers as people write them.
 */
import { describe, expect, it } from "vitest";
import { meaningOfHeader } from "../../shared/src/document/tables/headers";

describe("meaningOfHeader", () => {
  // common practice: the column names chemists use in VSEPR summary tables
  it.each([
    ["formula", "species"],
    ["Species", "species"],
    ["Compound", "species"],
    ["molecule", "species"],
    ["Ion", "species"],
    ["Chemical formula", "species"],
    ["name", "name"],
    ["Common name", "name"],
    ["Compound ID", "name"],
    ["compound_id", "name"],
    ["SMILES", "smiles"],
    ["smiles", "smiles"],
    ["Canonical SMILES", "smiles"],
    ["canonical_smiles", "smiles"],
    ["valence electrons", "valenceElectrons"],
    ["Valence_Electrons", "valenceElectrons"],
    ["valence e-", "valenceElectrons"],
    ["Valence e⁻", "valenceElectrons"],
    ["VE", "valenceElectrons"],
    ["# valence electrons", "valenceElectrons"],
    ["lone pairs on central atom", "lonePairs"],
    ["Lone pairs on centre", "lonePairs"],
    ["LP", "lonePairs"],
    ["lone-pairs", "lonePairs"],
    ["lone pairs (on S)", "lonePairs"],
    ["AXE", "axe"],
    ["AXE notation", "axe"],
    ["electron domain geometry", "electronGeometry"],
    ["Electron-pair geometry", "electronGeometry"],
    ["electron geometry", "electronGeometry"],
    ["shape", "molecularGeometry"],
    ["geometry", "molecularGeometry"],
    ["Molecular Geometry", "molecularGeometry"],
    ["molecular_shape", "molecularGeometry"],
    ["angle (deg)", "bondAngle"],
    ["bond angle / °", "bondAngle"],
    ["Bond angle (°)", "bondAngle"],
    ["bond_angle_deg", "bondAngle"],
    ["hybridisation", "hybridization"],
    ["Hybridization of central atom", "hybridization"],
    ["polar?", "polarity"],
    ["Polarity", "polarity"],
    ["polar (y/n)", "polarity"],
    ["Reagent", "name"],
    ["Reagents", "name"],
    ["Analyte", "name"],
    ["Charge", "charge"],
    ["net charge", "charge"],
    ["Ionic charge (e)", "charge"],
    ["ion_charge", "charge"],
  ])("%j means %s", (header, meaning) => {
    expect(meaningOfHeader(header)).toBe(meaning);
  });

  // A formal charge belongs to one atom and an oxidation state to one element: neither is the species' charge.
  it.each([
    "id",
    "cylinder",
    "supplier lot",
    "notes",
    "pressure / kPa",
    "room",
    "date",
    "dipole moment (D)",
    "formal charge",
    "oxidation state",
    // Free text: read by no check.
    "Description",
    "Comments",
  ])("%j means nothing to the checks", (header) => {
    expect(meaningOfHeader(header)).toBeUndefined();
  });
});
