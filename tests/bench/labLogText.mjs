// A plain-text lab log in the Kestrel Ridge style for the editor benchmarks: a dated heading per
// shift, timestamped lines that name gases and ions, half-reactions and equations on lines of
// their own, a numbered procedure now and then, and a few honest slips. Shifts are separated by a
// blank line, as people keep such logs. Returns the text, its lines, and which lines are
// timestamped entries (the lines a benchmark edits).

// common practice: formulas of gases and ions a gas store writes about.
const SPECIES = ["SF6", "NF3", "ClF3", "BF3", "NH3", "CO2", "SO2", "XeF4", "SF4", "PCl5", "H2O", "CH4", "IF5", "XeF2", "NO2+", "ClO4-"];

// from memory: standard half-reactions and balanced equations of a first-year text.
const EQUATIONS = [
  "Fe3+ + e- -> Fe2+",
  "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O",
  "Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O",
  "2H2 + O2 -> 2H2O",
  "SF4 + F2 -> SF6",
  "CaCO3 -> CaO + CO2",
];

const PEOPLE = ["Priya", "Marcus", "Dana", "Ines"];

/** `lines` lines of log; `entries` are the indexes of timestamped lines. */
export function labLogText(lines) {
  const out = [];
  const entries = [];
  let day = 0;
  let counter = 0;
  const next = () => SPECIES[counter++ % SPECIES.length];
  while (out.length < lines) {
    const date = new Date(Date.UTC(2026, 0, 5 + day));
    out.push(`${date.toISOString().slice(0, 10)}  gas store, shift ${PEOPLE[day % PEOPLE.length]}`);
    for (let entry = 0; entry < 12; entry++) {
      const minutes = 8 * 60 + entry * 25;
      const time = `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;
      entries.push(out.length);
      const lot = `KR-${String(400 + ((day * 12 + entry) % 600)).padStart(4, "0")}`;
      if (entry === 5) out.push(`${time}  ${EQUATIONS[day % EQUATIONS.length]}`);
      else if (entry === 9 && day % 7 === 3) out.push(`${time}  Label on ${lot} reads CH5, not ${next()}: sent back.`);
      else out.push(`${time}  Cylinder ${lot}: ${next()} at 2.${entry} bar, ${next()} line purged with N2.`);
    }
    if (day % 5 === 0) {
      out.push("Procedure for the scrubber check:");
      out.push(`1. Close the ${next()} and ${next()} valves.`);
      out.push("2. Flush with dry nitrogen for ten minutes.");
      out.push(`3. Log the NaOH trap reading; NH4+ and ClO4- stay below 5 ppm.`);
    }
    out.push("");
    day++;
  }
  out.length = lines;
  return { text: `${out.join("\n")}\n`, lines: out, entries: entries.filter((line) => line < lines) };
}
