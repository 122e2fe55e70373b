/**
 * Column meanings from headers as people write them.
 */
import { describe, expect, it } from "vitest";
import { languageOfHeader, meaningOfHeader } from "../../shared/src/document/tables/headers";

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
    // Every lone pair of the species, not the centre's.
    "Lone pairs (total)",
    "Total lone pairs",
    "lone pairs in molecule",
    // The central atom's own valence electrons, not the species' count.
    "Valence electrons (central atom)",
    "valence electrons of central atom",
    "Valenzelektronen am Zentralatom",
    // Free text: read by no check.
    "Description",
    "Comments",
  ])("%j means nothing to the checks", (header) => {
    expect(meaningOfHeader(header)).toBeUndefined();
  });

  // from memory: the column names of German, French and Spanish chemistry tables and lab exports
  it.each([
    ["Summenformel", "species", "de"],
    ["Formel", "species", "de"],
    ["Bezeichnung", "name", "de"],
    ["Verbindung", "name", "de"],
    ["Valenzelektronen", "valenceElectrons", "de"],
    ["Anzahl der Valenzelektronen", "valenceElectrons", "de"],
    ["freie Elektronenpaare", "lonePairs", "de"],
    ["freie Elektronenpaare (Zentralatom)", "lonePairs", "de"],
    ["Freie Elektronenpaare am Zentralatom", "lonePairs", "de"],
    ["freie EP am Zentralatom", "lonePairs", "de"],
    ["Molekülgeometrie", "molecularGeometry", "de"],
    ["Molekuelgeometrie", "molecularGeometry", "de"],
    ["Geometrie", "molecularGeometry", "de"],
    ["Elektronenpaargeometrie", "electronGeometry", "de"],
    ["Hybridisierung", "hybridization", "de"],
    ["Polarität", "polarity", "de"],
    ["Polaritaet", "polarity", "de"],
    ["Bindungswinkel (°)", "bondAngle", "de"],
    ["Ladung", "charge", "de"],
    ["Formule", "species", "fr"],
    ["Molécule", "name", "fr"],
    ["Doublets non liants", "lonePairs", "fr"],
    ["Géométrie", "molecularGeometry", "fr"],
    ["Polarité", "polarity", "fr"],
    ["Fórmula", "species", "es"],
    ["Nombre", "name", "es"],
    ["Electrones de valencia", "valenceElectrons", "es"],
    ["Geometría molecular", "molecularGeometry", "es"],
    ["Polaridad", "polarity", "es"],
  ])("%j means %s, in language %s", (header, meaning, language) => {
    expect([meaningOfHeader(header), languageOfHeader(header)]).toEqual([meaning, language]);
  });

  it.each(["Name", "formula", "Charge", "polar?", "Molecule"])("%j is English, or shared with English", (header) => {
    expect(languageOfHeader(header)).toBeUndefined();
  });

  it.each(["Lagerort", "Flasche", "Bemerkung", "Lieferant"])("German %j means nothing to the checks", (header) => {
    expect(meaningOfHeader(header)).toBeUndefined();
  });
});
