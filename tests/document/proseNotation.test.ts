/**
 * Everyday notation in running prose, read through the core's facade: what is found, what it is
 * read as, and what the checks say about it.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, analyzeOccurrence, analyzeSpecies, checkDocument, type DocumentKind } from "../../shared/src/index";
import { stripLabels } from "./labelledText";

/** The labelled spans are what is found, each read as the formula given after it, in order. */
function check(marked: string, formulas: readonly string[], kind: DocumentKind = "markdown"): void {
  const { text, labels } = stripLabels(marked);
  const found = analyzeDocument(text, kind).occurrences;
  expect(found.map((occurrence) => [occurrence.range.start, occurrence.text])).toEqual(labels.map((label) => [label.start, label.text]));
  expect(found.map((occurrence) => occurrence.reading.formula)).toEqual(formulas);
}

describe("an element with a Stock numeral in prose", () => {
  // common practice: lab reports write "the Fe(III) solution" for iron in the +3 state; alone, a
  // metal's numeral names its cation (from memory: IUPAC Red Book, Stock numbers)
  it.each([
    ["The ⟦Fe(III)⟧ solution turned orange.", ["Fe^3+"]],
    ["We added ⟦Cu(II)⟧ to the flask; ⟦Cr(VI)⟧ is toxic.", ["Cu^2+", "Cr^6+"]],
    ["The ⟦Fe(II)⟧/⟦Fe(III)⟧ couple and ⟦Sn(IV)⟧ in acid.", ["Fe^2+", "Fe^3+", "Sn^4+"]],
    ["⟦Fe(III)(aq)⟧ was titrated.", ["Fe^3+"]],
    ["⟦iron(III) chloride⟧ and ⟦FeCl3⟧ are one salt.", ["FeCl3", "FeCl3"]],
    // from memory: IUPAC Red Book; a nonmetal's oxidation state is shared by many species
    ["Hypervalent I(III) reagents and S(VI) species; ⟦SO4^2-⟧ is one.", ["SO4^2-"]],
  ])("%s", (marked, formulas) => {
    check(marked, formulas);
  });

  // common practice: what the core says of the cation is what it says of the numeral
  it.each([
    ["The Fe(III) solution.", "Fe3+"],
    ["An Al(III) salt.", "Al3+"],
  ])("%s is analysed as %s is", (text, cation) => {
    const [occurrence] = analyzeDocument(text, "markdown").occurrences;
    const asWritten = analyzeOccurrence(occurrence);
    const expected = analyzeSpecies(cation);
    expect(asWritten.ok).toBe(expected.ok);
    if (!asWritten.ok && !expected.ok) expect(asWritten.problem).toEqual(expected.problem);
    if (asWritten.ok && expected.ok) expect(asWritten.value.warnings).toEqual(expected.value.warnings);
  });

  it("raises no error for a Stock numeral in prose", () => {
    const text = "The Fe(III) solution, Cu(II), Hg(I), Al(III), As(V) and S(VI) were logged.";
    const findings = checkDocument(analyzeDocument(text, "markdown"));
    expect(findings.filter((finding) => finding.severity === "error")).toEqual([]);
  });
});

describe("structural formulas with single-bond dashes in prose", () => {
  // from memory: CRC Handbook, structural formulas of ethane, 1,2-dichloroethane, methanol,
  // ethanol, dimethyl ether, hydrogen peroxide, hydrazine, acetone, acetic acid, nitric acid and
  // hexane; each group between the dashes is open on exactly the bonds the dashes draw (common practice)
  it.each([
    ["The fuel, ⟦CH3-CH3⟧, burns; so does ⟦CH3–CH3⟧.", ["CH3CH3", "CH3CH3"]],
    ["Degreaser ⟦Cl-CH2-CH2-Cl⟧ and wood spirit ⟦CH3-OH⟧.", ["ClCH2CH2Cl", "CH3OH"]],
    ["Grain spirit is ⟦H3C-CH2-OH⟧, its ether ⟦H3C–O–CH3⟧.", ["H3CCH2OH", "H3COCH3"]],
    ["⟦HO-OH⟧ and ⟦H2N-NH2⟧ are both kept cold.", ["HOOH", "H2NNH2"]],
    ["⟦CH3-CO-CH3⟧ rinse, then ⟦CH3-COOH⟧ and ⟦HO-NO2⟧.", ["CH3COCH3", "CH3COOH", "HONO2"]],
    ["The C6 solvent ⟦(CH3-(CH2)4-CH3)⟧ is dry.", ["CH3(CH2)4CH3"]],
  ])("%s", (marked, formulas) => {
    check(marked, formulas);
  });

  // common practice: a dash also joins the atoms of an angle or a bond, and two species of a
  // mixture; from memory: NO and NO2 are molecules of their own, though their valences look open
  it.each([
    "The F-S-F angle, the H–O–H angle, the C-H bond and the Si-O-Si link.",
    "An NF3-SF6 mixture, an N2-O2 blend, H2O-CO2 ices and an SF6–N2 feed.",
    "The NO-NO2 pair in smog; CH2-CH2 and CH-CH are not drawn closed.",
  ])("%s is not read as one molecule", (text) => {
    const found = analyzeDocument(text, "markdown").occurrences.map((occurrence) => occurrence.text);
    expect(found.filter((written) => /[-\u2013]/.test(written))).toEqual([]);
  });
});

describe("a group called a fragment, residue or unit", () => {
  // common practice: mass-spectrum and polymer notes call a piece of a molecule a fragment or a
  // repeat unit; from memory (atomic numbers and usual valences, IUPAC periodic table): CH2 has 8
  // electrons but its carbon has two bonds free, NH and CF2 likewise, while SF4 (50 electrons),
  // CO2 and CH2O hold together on their own
  it.each([
    ["The CH2 fragments, NH fragments and CF2 fragments; ⟦SF4⟧ fragments too.", ["SF4"]],
    ["Polyethylene is CH2 units; the ⟦CO2⟧ fragment and the ⟦CH2O⟧ fragments.", ["CO2", "CH2O"]],
    ["Loss of the CH3 fragment and a fragment (CH2) of the chain.", []],
    ["The scrubber unit (⟦MnO2⟧ bed) and the ⟦NF3⟧ abatement unit.", ["MnO2", "NF3"]],
  ])("%s", (marked, formulas) => {
    check(marked, formulas);
  });

  // common practice: the writer's word says the open valence or odd electron is meant
  it.each([
    ["The CH2 fragments, CH2 units, the CH2 moiety, CH2 groups and the C(CH3)2 units of the chain.", []],
    ["CH3 radicals and the C(CH3)2 radical; the C(CH3)2 was weighed.", ["no-valid-structure"]],
  ])("%s gives findings %j", (text, codes) => {
    expect(checkDocument(analyzeDocument(text, "markdown")).map((finding) => finding.code)).toEqual(codes);
  });
});

describe("halo-complex anions named by rule in prose", () => {
  // from memory: IUPAC Red Book, additive names of halo-complex anions (ICl2- dichloroiodate(I),
  // AuCl4- tetrachloroaurate(III), PtCl6 2- hexachloroplatinate(IV), AlF6 3- hexafluoroaluminate)
  // and their acids (HAuCl4 tetrachloroauric acid, H2PtCl6 hexachloroplatinic acid)
  it.each([
    ["⟦Potassium dichloroiodate(I)⟧ was used; then ⟦dichloroiodate(I)⟧ formed.", ["KICl2", "ICl2^-"]],
    ["The ⟦tetrachloroaurate⟧ ion and ⟦tetrachloroaurate(III)⟧ in the bath.", ["AuCl4^-", "AuCl4^-"]],
    ["⟦hexachloroplatinate(IV)⟧ and ⟦hexafluoroaluminate⟧ in the melt.", ["PtCl6^2-", "AlF6^3-"]],
    ["Add ⟦tetrachloroauric acid⟧ and ⟦hexachloroplatinic acid⟧ dropwise.", ["HAuCl4", "H2PtCl6"]],
    // common practice: an ion name before "salt" names a class of salts, as "a nitrate salt" does
    ["Dissolve the tetrachloroiodate(III) salt; tetrachloric and dichloroiodic are no names.", []],
  ])("%s", (marked, formulas) => {
    check(marked, formulas);
  });
});
