/**
 * Species written the way other writers write them: HTML sub- and superscripts in converted course
 * pages, LaTeX math, mhchem with labelled arrows and text escapes, plain-text equations. Each
 * document marks every species the scanner must report with ⟦ ⟧, and nothing else.
 */
import { describe, expect, it } from "vitest";
import { analyzeDocument, checkDocument, type DocumentKind } from "../../shared/src/index";
import { lineAndColumn, stripLabels } from "./labelledText";

/** The scanner's occurrences against the labels, as "line:column text" lists. */
function check(marked: string, kind: DocumentKind): void {
  const { text, labels } = stripLabels(marked);
  const found = analyzeDocument(text, kind).occurrences.map(
    (occurrence) => `${lineAndColumn(text, occurrence.range.start)} ${occurrence.text}`,
  );
  expect(found).toEqual(labels.map((label) => `${lineAndColumn(text, label.start)} ${label.text}`));
}

/** The formula each occurrence of `text` reads as. */
function formulas(text: string, kind: DocumentKind): string[] {
  return analyzeDocument(text, kind).occurrences.map((occurrence) => occurrence.reading.formula);
}

describe("HTML sub- and superscripts", () => {
  // common practice: how web pages and converted course notes set formulas
  it.each([
    ["Cylinder 7 held ⟦carbon dioxide⟧ (⟦CO<sub>2</sub>⟧) at 50 bar.", "markdown"],
    ["The salt ⟦Al<sub>2</sub>(CO<sub>3</sub>)<sub>3</sub>⟧ is not stable when wet.", "markdown"],
    ["The scrubber liquor holds ⟦SO<sub>4</sub><sup>2−</sup>⟧ and ⟦NH<sub>4</sub><sup>+</sup>⟧ ions.", "markdown"],
    ["Dissolve ⟦FeCl<sub>3</sub>⟧ in ⟦H<sub>2</sub>O⟧; the ⟦Fe<sup>3+</sup>⟧ ion is yellow.", "markdown"],
    ["Isotopes such as <sup>13</sup>C and indices x<sub>i</sub> are not species.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reads each HTML formula as the formula it spells", () => {
    // from memory: sulfate SO4 2-, aluminium carbonate Al2(CO3)3
    expect(formulas("CO<sub>2</sub>, SO<sub>4</sub><sup>2-</sup>, Al<sub>2</sub>(CO<sub>3</sub>)<sub>3</sub>", "markdown")).toEqual([
      "CO2",
      "SO4^2-",
      "Al2(CO3)3",
    ]);
  });

  it("reads an HTML formula in a table's formula cell, over the whole cell", () => {
    const text = "| Formula | Shape |\n|---|---|\n| CO<sub>2</sub> | linear |\n";
    const [record] = analyzeDocument(text, "markdown").records;
    expect(text.slice(record.species.range.start, record.species.range.end)).toBe("CO<sub>2</sub>");
    // from memory: CO2 is linear, so the row is right
    expect(checkDocument(analyzeDocument(text, "markdown"))).toEqual([]);
  });
});

describe("sub- and superscripts in other markup", () => {
  // common practice: course pages with HTML entities, reference wikis, AsciiDoc handbooks,
  // reStructuredText guides and memos pasted from a word processor
  it.each([
    ["Add ⟦SO<sub>4</sub><sup>2&minus;</sup>⟧ &rarr; ⟦BaSO<sub>4</sub>⟧ with&nbsp;⟦Ba<sup>2+</sup>⟧.", "markdown"],
    ["'''⟦NF{{sub|3}}⟧''' and [[sulfur hexafluoride|⟦SF{{sub|6}}⟧]]; the ion ⟦SO{{sub|4}}{{sup|2−}}⟧.", "plaintext"],
    ["|⟦carbon dioxide⟧ |⟦CO~2~⟧ |linear\n\nThe band at 2349 cm^-1^ of ⟦^13^CO~2~⟧ and ⟦F^-^⟧ in ⟦H~2~O⟧.", "plaintext"],
    ["Purge with ⟦N\\ :sub:`2`⟧; the ⟦SO\\ :sub:`4`\\ :sup:`2-`⟧ film and ⟦H\\ :sub:`2`\\ O⟧ go.", "plaintext"],
    ["⟦Ag⁺⟧ + ⟦Cl–⟧ → ⟦AgCl⟧, then ⟦CrO₄²−⟧ and “⟦SO4 2–⟧”; pages 41–44, the Cl–C–Cl angle.", "plaintext"],
    ["Soft hyphens: ⟦sulfur tetra\u00adfluoride⟧ and ⟦tetra\u00adhydro\u00adfuran⟧, ⟦carbon di\u200boxide⟧.", "plaintext"],
    ["Not species: K<sub>a2</sub>, T<sub>d</sub>, AX<sub>4</sub>, sp<sup>3</sup>, M<sup>n+</sup>, ν~3~, C~3v~.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("LaTeX source kept as plain text", () => {
  // common practice: cross-reference keys, citations and verbatim environments in LaTeX reports
  it.each([
    ["\\section{Why}\\label{sec:NO2}\nSee Eq.~\\ref{eq:NO2} and \\cite{KR2025NO2}: ⟦NO\\textsubscript{2}⟧ forms.", "plaintext"],
    ["\\usepackage[version=4]{mhchem}\nUse \\ce{⟦KNO3⟧} (Table~\\ref{tab:KNO3}) and $c(\\mathrm{⟦NO_2^-⟧})$.", "plaintext"],
    ["Before ⟦SO2⟧.\n\\begin{verbatim}\ngriess --gas NO2\n\\end{verbatim}\nAfter ⟦CO2⟧.", "plaintext"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("state symbols after a space", () => {
  // common practice: word-processor and handbook text often puts a space before the state symbol
  it.each([
    ["⟦NaCl (s)⟧ dissolves to ⟦Na⁺ (aq)⟧; ⟦H₂SO₄ (aq)⟧ too, but salt(s) and (s)-forms stay words.", "plaintext"],
    ["Dry ⟦CO2 (g)⟧ and ⟦H2O (l)⟧, then ⟦CO2⟧ (gas) in words.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("isotope labels", () => {
  // from memory: IUPAC nuclide notation; D for hydrogen-2 (IUPAC recommendations)
  it.each([
    ["The labelled salt is ⟦NaH¹³CO3⟧; the gas is ⟦¹²CO₂⟧, ⟦13CO2⟧ and ⟦D2O⟧ in ⟦CD3OD⟧.", "markdown"],
    ["A tracer of ⟦<sup>13</sup>CO<sub>2</sub>⟧ and ⟦H<sub>2</sub><sup>18</sup>O⟧.", "markdown"],
    ["Ratio $R = n(⟦^{13}CO_2⟧)/n(⟦^{12}CO_2⟧)$ and $\\mathrm{⟦C^{16}O^{18}O⟧}$.", "markdown"],
    ["Atoms are not species: ¹H NMR, ¹³C shifts, $^{18}$O, $\\delta^{13}\\mathrm{C}$, 2H and 12 ⟦CO2⟧ cylinders.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reads a labelled species as the unlabelled one, with its labels", () => {
    const [occurrence] = analyzeDocument("Background 13CO2 in air.", "plaintext").occurrences;
    // from memory: carbon-13 dioxide is CO2 with one carbon-13
    expect(occurrence.reading.formula).toBe("CO2");
    expect(occurrence.reading.isotopes?.map((label) => [label.symbol, label.massNumber])).toEqual([["C", 13]]);
  });
});

describe("LaTeX math outside mhchem", () => {
  // common practice: how LaTeX-minded writers type formulas in markdown
  it.each([
    ["⟦Ferricyanide⟧, $\\mathrm{⟦Fe(CN)_{6}^{3-}⟧}$, stains blue.", "markdown"],
    ["Dry the gas over ⟦silica⟧ to remove $⟦H_2O⟧$ before the cell.", "markdown"],
    ["Combustion: $2⟦H_2⟧ + ⟦O_2⟧ \\rightarrow 2⟦H_2O⟧$.", "markdown"],
    ["The cation \\(⟦NH_4^+⟧\\) and the anion \\(⟦SO_4^{2-}⟧\\).", "markdown"],
    ["Nested: $\\ce{⟦SO4^2-⟧ + ⟦Ba^2+⟧ -> ⟦BaSO4⟧ v}$ in the notes.", "markdown"],
    ["Math is not chemistry: $x_i$, $E = mc^2$, $K_a$, $\\Delta H$, $pK_a$.", "markdown"],
    ["Prices: $5 and $10 per cylinder, or $5-$10 for small ones.", "markdown"],
    ["$$\\mathrm{⟦CO_2⟧ + ⟦H_2O⟧ \\rightleftharpoons ⟦H_2CO_3⟧}$$ and $⟦\\text{CO}_2⟧$, $2\\,\\mathrm{⟦H_2O_2⟧}$.", "markdown"],
    [
      "States in math: $\\mathrm{⟦NaCl_{(aq)}⟧}$, $⟦\\text{CO}_{2(g)}⟧$, $\\mathrm{⟦H_2O(l)⟧}$; text mode ⟦H\\textsubscript{2}O⟧.",
      "markdown",
    ],
    ["The draft was $⟦H_2O⟧$-free, dried under ⟦N_2⟧; no ⟦H_2O⟧ left. Not CO_2_ppm or run_2.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reads math as the formula it spells", () => {
    // from memory: ferricyanide is [Fe(CN)6]3-
    expect(formulas("$\\mathrm{Fe(CN)_{6}^{3-}}$ and $SO_4^{2-}$", "markdown")).toEqual(["Fe(CN)6^3-", "SO4^2-"]);
  });
});

describe("mhchem details", () => {
  // common practice: mhchem arrow labels, text escapes and schematic letters
  it.each([
    ["\\ce{⟦SF4⟧ + ⟦H2O⟧ ->[⟦HF⟧] ⟦SOF2⟧ + 2 ⟦HF⟧}", "markdown"],
    ["\\ce{⟦CaCO3⟧ ->[{heat}] ⟦CaO⟧ + ⟦CO2⟧ ^}", "markdown"],
    ["\\ce{⟦N2⟧ + 3⟦H2⟧ <=>[⟦Fe⟧][{400 °C}] 2⟦NH3⟧}", "markdown"],
    ["\\ce{A ->[⟦H2O⟧] B} is the general scheme.", "markdown"],
    ["\\ce{{Ox} + e- -> {Red}}", "markdown"],
    // A state symbol is part of the mention, in mhchem as in prose, glued or after a space.
    ["\\ce{⟦NaCl(aq)⟧ + ⟦AgNO3(aq)⟧ -> ⟦AgCl(s)⟧ + ⟦NaNO3(aq)⟧}", "markdown"],
    ["\\ce{⟦Ag+ (aq)⟧ + ⟦Cl- (aq)⟧ -> ⟦AgCl⟧ v}", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reports no error for schematic letters or text in labels", () => {
    const text = "\\ce{A ->[H2SO4, heat] B} and \\ce{X + Y -> Z}";
    expect(checkDocument(analyzeDocument(text, "markdown")).filter((finding) => finding.severity === "error")).toEqual([]);
  });
});

describe("chemformula's \\ch, read as mhchem's \\ce", () => {
  // common practice: chemformula writes formulas, charges, coefficients and arrows as mhchem does
  it.each([
    ["Inlet: \\ch{⟦SO2⟧} in \\ch{⟦N2⟧}.", "latex"],
    ["\\ch{⟦SO2⟧ + 2 ⟦NaOH⟧ -> ⟦Na2SO3⟧ + ⟦H2O⟧} \\label{eq:sulfite} \\\\", "latex"],
    ["mostly \\ch{⟦HSO3-⟧}, and \\ch{⟦SO3^2-⟧} at pH 12", "latex"],
    ["$\\ch{⟦NF3⟧}$ in math too", "latex"],
    ["In markdown notes: \\ch{⟦SF4⟧ + 2 ⟦H2O⟧ -> ⟦SO2⟧ + 4 ⟦HF⟧}", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  // from memory: SO2 + 2 NaOH -> Na2SO3 + H2O and Na2SO3 + SO2 + H2O -> 2 NaHSO3 (sulfite scrubbing)
  it.each([
    ["a balanced equation", "\\ch{SO2 + 2 NaOH -> Na2SO3 + H2O} \\label{eq:a} \\\\\n\\ch{Na2SO3 + SO2 + H2O -> 2 NaHSO3}\n", []],
    ["an unbalanced one", "\\ch{SO2 + NaOH -> Na2SO3 + H2O}\n", ["equation-unbalanced"]],
  ])("%s gets the equation findings of a \\ce", (_, text, expected) => {
    const equationCodes = (source: string) =>
      checkDocument(analyzeDocument(source, "latex"))
        .map((finding) => finding.code)
        .filter((code) => code.startsWith("equation-"));
    expect(equationCodes(text)).toEqual(expected);
    expect(equationCodes(text.replaceAll("\\ch{", "\\ce{"))).toEqual(expected);
  });
});

describe("LaTeX math around the script only", () => {
  // common practice: older LaTeX reports write SO$_2$, H$_2$O and Ca$^{2+}$ in text mode
  it.each([
    ["Inlet ⟦SO$_2$⟧ in ⟦N$_2$⟧, product ⟦H$_{2}$O⟧.", "latex"],
    ["Liquor ⟦H$_2$SO$_4$⟧ and ⟦K$_2$Cr$_2$O$_7$⟧.", "latex"],
    ["Ions ⟦Ca$^{2+}$⟧, ⟦Cl$^-$⟧ and ⟦Na$^+$⟧.", "latex"],
    // Read whole, or the formula would be CO.
    ["The ⟦CO$_{2}$⟧ doublet.", "latex"],
    ["In markdown too: ⟦H$_2$O⟧.", "markdown"],
    // A count and a charge in one span is not one script: left unread rather than read as SO4.
    ["The SO$_4^{2-}$ band.", "latex"],
    ["It costs $5 and $_x$ is math.", "latex"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reads CO$_{2}$ as carbon dioxide", () => {
    expect(formulas("The CO$_{2}$ doublet.", "latex")).toEqual(["CO2"]);
  });
});

describe("plain-text equations", () => {
  // common practice: equations typed in plain text and student reports
  it.each([
    ["⟦H2⟧ burns: 2⟦H2⟧ + ⟦O2⟧ → 2⟦H2O⟧", "plaintext"],
    ["⟦C⟧ + ⟦O2⟧ -> ⟦CO2⟧", "plaintext"],
    ["Thermite: 2 ⟦Al⟧ + ⟦Fe2O3⟧ → ⟦Al2O3⟧ + 2 ⟦Fe⟧", "plaintext"],
    ["2 ⟦Al⟧ + ⟦Fe2O3⟧ gives a lot of heat.", "plaintext"],
    ["Vitamin C + zinc. I + you. A 3D print, a 4K screen, 2CO in words.", "plaintext"],
    ["Grade B → grade A after the retest.", "plaintext"],
    // common practice: without superscripts a charge is typed after a space
    ["⟦I2⟧ + 2⟦S2O3 2-⟧ -> 2⟦I-⟧ + ⟦S4O6 2-⟧", "plaintext"],
    ["⟦Sulfate⟧ as ⟦SO4 2-⟧. Add 2-3 g of ⟦NaCl⟧; ⟦NO3⟧ 2-fold.", "plaintext"],
    // common practice: titration records write the volume, amount or mass of a species as V(X), n(X), m(X)
    ["V(⟦NaOH⟧)/mL   25.30\nn(⟦KHP⟧) = m / M\nV(⟦HCl⟧) = 10.00 mL", "plaintext"],
    ["⟦V(OH)3⟧ and ⟦V(CO)6⟧ are vanadium compounds.", "plaintext"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("formula-shaped text that is not a species", () => {
  // common practice: how organic notes, biology, metallurgy, sample logs and labels use such tokens
  it.each([
    ["Alcohols R–OH and anilines Ar–NH₂ differ; ketones R–CO–R are neutral.", "plaintext"],
    ["The ring carries the Ar–OH and the –COOCH₃ groups ortho to each other.", "markdown"],
    ["A nitro group (NO₂) withdraws electrons, as does the NO₂ group of ⟦nitrobenzene⟧; ⟦NO₂⟧ gas is brown.", "markdown"],
    ["¹H NMR: δ 4.12 (q, J = 7.1 Hz, 2H, OCH₂), 2.05 (s, 3H, COCH₃).", "markdown"],
    ["NF-κB signalling was unaffected by the wash.", "markdown"],
    ["Brackets are machined from Ti6Al4V bar stock.", "plaintext"],
    ["Runs P1, P2 (pilot) and N1, N2 (north drain); the N2 extraction ran late.", "plaintext"],
    ["Purge the line with ⟦N2⟧, then ⟦O2⟧.", "plaintext"],
    ["Hazard statements H315, H319 and H335; precautions P261 and P280.", "plaintext"],
    ["An ⟦Ar⟧-purged glove box; ⟦SF6⟧–⟦N2⟧ mixtures.", "markdown"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("a formula before a noun", () => {
  // common practice: how lab notes name a gas by what it is kept in or measured as, and how organic
  // and mass-spectrum notes call a piece of a molecule a fragment or residue. A group cut at one
  // bond is a radical as written, with an odd electron count (from memory: atomic numbers, IUPAC
  // periodic table: CH3 has 9 electrons, OCH3 17, C6H5 41, COOH 23; SF4 has 50, CO2 22).
  it.each([
    ["⟦SF4⟧ fragments were seen.", "plaintext"],
    ["The ⟦SF₅⁺⟧ fragments and the ⟦CO2⟧ fragment peak.", "markdown"],
    ["⟦NF3⟧ lines, ⟦SF6⟧ cylinders, ⟦CO2⟧ levels, ⟦NH3⟧ readings and ⟦H2O⟧ droplets.", "plaintext"],
    ["Loss of the OCH₃ fragment, then CH3 fragments and a C6H5 residue.", "markdown"],
    ["The COOH residues and NH residues of the peptide; the fragment (OCH3) too.", "plaintext"],
    ["The CH3 groups and the C(CH3)3 group; ⟦SF4⟧ residue in the trap.", "plaintext"],
  ])("%s", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });
});

describe("plain text read a paragraph at a time", () => {
  // common practice: a blank line ends a paragraph, and inline markup (code spans, math) with it;
  // a comment runs until its close, however many paragraphs it hides; run ids are numbered from 1
  const filler = "Notes on the bench follow here. ".repeat(80);
  it.each([
    ["Runs N1, N2 (north drain) and P1.\n\nThe N2 extraction ran late.\n\n⟦SF6⟧ was fine."],
    [`Runs N1, N2.\n\n${filler}\n\nPurge with ⟦N2⟧.`],
    ["⟦SF4⟧ first.\n\n<!-- draft, not checked:\n\nCH5 and Sf4 here.\n\n-->\n⟦NF3⟧ after."],
    ["⟦SF4⟧ first.\r\n\r\n<!-- left open\r\n\r\nCH5 here.\r\n"],
    ["A stray ` tick here.\n\n⟦XeF4⟧ is square planar; `code` too."],
    ["An open $ sign costs $5\n\nand ⟦H2O⟧ is $2 a litre."],
  ])("%s", (marked) => {
    check(marked, "plaintext");
  });
});

describe("data columns", () => {
  // common practice: compound libraries and cabinet lists keep a SMILES column and leave cells
  // empty with a dash or "n/a"
  it.each([
    ["Compound ID,SMILES\nLimonene,⟦CC1=CCC(CC1)C(=C)C⟧\nKR-C-0012,⟦CCO⟧\n", "csv"],
    ["name,canonical smiles\n⟦ethanol⟧,⟦CCO⟧\n⟦water⟧,⟦O⟧\n", "csv"],
    [
      "Chemical name,Formula,Notes\n⟦Sodium chloride⟧,⟦NaCl⟧,\nUniversal indicator,—,mixture\npH 7 buffer,n/a,\nPhenol red solution,-,\n",
      "csv",
    ],
    ["| Compound | Formula |\n|---|---|\n| ⟦water⟧ | ⟦H2O⟧ |\n| tap rinse | — |\n", "markdown"],
    // common practice: inventories write the grade, form or a synonym after the name
    [
      "Chemical name,Formula\n⟦Hydrochloric acid⟧ 2 M,⟦HCl⟧\n⟦Zinc⟧ granules,⟦Zn⟧\n⟦Calcium carbonate⟧ (marble chips),⟦CaCO3⟧\n⟦Propanone⟧ (⟦acetone⟧),⟦CH3COCH3⟧\n",
      "csv",
    ],
    ["Chemical name\tCAS\n⟦Sodium hydroxide⟧ pellets\t1310-73-2\n⟦Ammonia⟧ solution 0.880\t1336-21-6\n", "tsv"],
    // common practice: "basic" after a salt's name is the basic salt; "cresol red" is a dye, not cresol
    ["Chemical name,Formula\nCopper(II) carbonate basic,⟦CuCO3.Cu(OH)2⟧\n⟦Methyl orange⟧ solution,—\nCresol red,—\n", "csv"],
  ])("%j", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("reads a SMILES column as SMILES, with the composition the SMILES spells", () => {
    // source: RDKit, CalcMolFormula("CC1=CCC(CC1)C(=C)C") = C10H16 (limonene)
    const [occurrence] = analyzeDocument("Compound ID,SMILES\nLimonene,CC1=CCC(CC1)C(=C)C\n", "csv").occurrences;
    expect(occurrence.reading.notation).toBe("smiles");
    expect(occurrence.reading.formula).toBe("C10H16");
  });

  it("gives no finding for placeholders and unknown ids, and reports a SMILES that does not parse", () => {
    const text = "Compound ID,SMILES,Formula\nKR-C-0012,C1CC(,—\nKR-C-0013,CCO,n/a\n";
    const findings = checkDocument(analyzeDocument(text, "csv")).map((finding) => [
      finding.severity,
      text.slice(finding.range.start, finding.range.end),
    ]);
    // common practice: an unclosed branch "(" makes a SMILES unreadable
    expect(findings).toEqual([["error", "C1CC("]]);
  });
});

describe("code spans and reStructuredText", () => {
  // common practice: how package READMEs and notes write SMILES, links, math roles and code
  it.each([
    ["⟦Acetic acid⟧ is `⟦CC(=O)O⟧` and ⟦phenol⟧ `⟦c1ccc(cc1)O⟧`; `smiles:⟦CCO⟧` is marked.", "markdown"],
    ["Code such as `config`, `H3PO4`, `foo()`, `n/a`, `x = 1`, `CO` and `C1CC` is not offered.", "markdown"],
    ["Polyprotic acids (:math:`\\mathrm{⟦H_3PO_4⟧}`) lose protons in steps.", "plaintext"],
    ["See `the note on dissolved ⟦CO2⟧ <https://docs.kestrel-ridge.example/carbonate.html>`_ first.", "plaintext"],
    [
      'Run it like this:\n\n.. code-block:: python\n\n    t = Titration(analyte="CH3COOH", titrant="NaOH")\n\nThen ⟦NaOH⟧ is added.\n',
      "plaintext",
    ],
    ["The output::\n\n    NH3 HCl H3PO4\n\nends the run with ⟦HCl⟧.\n", "plaintext"],
    [
      ".. math::\n\n   K_a = \\frac{[\\mathrm{⟦H_3O^+⟧}][\\mathrm{A^-}]}{[\\mathrm{HA}]}\n\n.. note::\n\n   Keep ⟦NaOH⟧ closed.\n",
      "plaintext",
    ],
  ])("%j", (marked, kind) => {
    check(marked, kind as DocumentKind);
  });

  it("offers an unmarked SMILES for hovers and tables but never reports on it", () => {
    // source: RDKit, CalcMolFormula("CC(=O)O") = C2H4O2 (acetic acid)
    // common practice: [CH2] with one hydrogen short makes c1ccc(cc1)[CH2] the benzyl radical, which
    // a marked SMILES would report
    const model = analyzeDocument("Stock: `CC(=O)O` and `c1ccc(cc1)[CH2]`.", "markdown");
    expect(model.occurrences.map((occurrence) => [occurrence.reading.notation, occurrence.reading.formula])).toEqual([
      ["smiles", "C2H4O2"],
      ["smiles", "C7H7"],
    ]);
    expect(checkDocument(model)).toEqual([]);
  });
});
