// A long lab notebook in the Kestrel Ridge style for the editor benchmarks: headings, prose that
// names many species, mhchem spans, chemistry fences and pipe tables, with a few honest slips.
// Returns the text and where each species mention is, so hovers can be aimed at them.

// common practice: formulas of gases and ions a gas lab writes about, and their shapes.
const SPECIES = [
  ["SF6", "octahedral"],
  ["NF3", "trigonal pyramidal"],
  ["ClF3", "T-shaped"],
  ["BF3", "trigonal planar"],
  ["NH3", "trigonal pyramidal"],
  ["CO2", "linear"],
  ["SO2", "bent"],
  ["XeF4", "square planar"],
  ["SF4", "seesaw"],
  ["PCl5", "trigonal bipyramidal"],
  ["H2O", "bent"],
  ["CH4", "tetrahedral"],
  ["IF5", "square pyramidal"],
  ["XeF2", "linear"],
  ["NO2+", "linear"],
  ["ClO4-", "tetrahedral"],
  ["NH4+", "tetrahedral"],
  ["SO4^2-", "tetrahedral"],
  ["PF6-", "octahedral"],
  ["BrF5", "square pyramidal"],
  ["H2S", "bent"],
  ["PH3", "trigonal pyramidal"],
  ["SiH4", "tetrahedral"],
  ["O3", "bent"],
  ["N2O", "linear"],
  ["HCN", "linear"],
  ["CH2O", "trigonal planar"],
  ["SOCl2", "trigonal pyramidal"],
  ["POCl3", "tetrahedral"],
  ["XeO3", "trigonal pyramidal"],
  ["I3-", "linear"],
  ["ICl4-", "square planar"],
];

/** `lines` lines of notebook; `mentions` are { line, character, text } of every species written. */
export function notebookText(lines) {
  const out = [];
  const mentions = [];
  let run = 14;
  let counter = 0;
  const next = () => SPECIES[counter++ % SPECIES.length];
  const prose = (template) => {
    // Each "@" becomes the next species; its place is remembered.
    let line = "";
    for (const part of template.split("@")) {
      if (line.length > 0 || part !== template.split("@")[0]) {
        const [formula] = next();
        mentions.push({ line: out.length, character: line.length, text: formula });
        line += formula;
      }
      line += part;
    }
    out.push(line);
  };
  while (out.length < lines) {
    out.push(`## Run ${run}: fluorinating agents for the etch study`, "");
    prose("Priya logged @ and @ at the start of the shift; the @ line read 2.1 bar.");
    prose("We compared @ against @ in cell B, then vented @ through the scrubber.");
    out.push("");
    const [formula, shape] = next();
    out.push("| Formula | Molecular geometry |", "|---|---|");
    mentions.push({ line: out.length, character: 2, text: formula });
    out.push(`| ${formula} | ${shape} |`);
    const [other, otherShape] = next();
    mentions.push({ line: out.length, character: 2, text: other });
    out.push(`| ${other} | ${run % 5 === 0 ? "trigonal planar" : otherShape} |`, "");
    prose("The balance: $\\ce{@ + F2 -> SF6}$, checked by Marcus in room 3.");
    out.push("");
    out.push("```chem");
    const [fenced] = next();
    mentions.push({ line: out.length, character: 0, text: fenced });
    out.push(`${fenced} + F2 -> SF6`, "```", "");
    prose(run % 7 === 0 ? "A slip to fix: the label said CH5 next to @." : "Stored @ in the cold room next to @.");
    out.push("");
    run++;
  }
  out.length = lines;
  return { text: `${out.join("\n")}\n`, mentions: mentions.filter((mention) => mention.line < lines), lines: out };
}
