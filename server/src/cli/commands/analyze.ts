/**
 * `lonepair analyze [--json] [--smiles] <species...>`: one card (or JSON object) per argument.
 * With `--smiles` every argument is read as a SMILES string (a whole molecule, every atom with
 * two or more neighbours described). Exit 0 when every species was analysed, 1 when any was
 * not, 2 on a usage error.
 */
import { analyzeSmiles, analyzeTyped } from "../../../../shared/src/index";
import { formatAnalysisCard } from "../../../../shared/src/index";
import { toAnalysisJson } from "../../../../shared/src/index";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, parseCommandLine, usageError } from "../cliCommand";
import { cardStyle } from "../terminalStyle";

const HELP = `Usage: lonepair analyze [--json] [--smiles] <species...>

Works out the Lewis structure and VSEPR shape of each species: a formula (SF4, NH4+,
SO4^2-), a condensed structural formula (CH3COOH), an mhchem span (\\ce{XeF4}), a
name ("sulfur tetrafluoride") or a SMILES string after the marker smiles:
('smiles:F/C=C\\F'). Quote names and anything your shell might expand. Each argument is one
species.

Options:
  --json    print a JSON array, one object per species, instead of text cards
  --smiles  read every argument as a SMILES string ('c1ccccc1', 'CC(=O)O') and describe
            each atom with two or more neighbours
  --help    show this help

Exit status: 0 every species analysed, 1 any species not analysed, 2 usage error.
`;

export const analyzeCommand: CliCommand = {
  name: "analyze",
  summary: "shape, angles, polarity and hybridization of each species given",
  help: HELP,
  run: runAnalyze,
};

function runAnalyze(args: readonly string[], io: CliIo): number {
  const parsed = parseCommandLine(analyzeCommand, args, io, { json: { type: "boolean" }, smiles: { type: "boolean" } });
  if (parsed.exit !== undefined) return parsed.exit;
  const speciesTexts = parsed.positionals;
  if (speciesTexts.length === 0) return usageError(analyzeCommand, io, "give at least one species.");

  // A SMILES string such as "CO" or "NO" is also a formula, so the reader is told, never left to guess.
  const analyze = parsed.values.smiles ? analyzeSmiles : analyzeTyped;
  const results = speciesTexts.map((text) => ({ text, result: analyze(text) }));
  // A salt or hydrate counts as analysed (each of its parts was), and so does a network solid
  // (each atom's surroundings are given).
  const failures = results.filter(({ result }) => !result.ok && result.parts === undefined && result.lattice === undefined).length;

  if (parsed.values.json) {
    const json = results.map(({ text, result }) => toAnalysisJson(text, result));
    io.writeOut(JSON.stringify(json, null, 2) + "\n");
  } else {
    const style = cardStyle(io.colour);
    io.writeOut(results.map(({ text, result }) => formatAnalysisCard(text, result, style)).join("\n"));
    if (results.length > 1) {
      io.writeOut(`\n${results.length} species: ${results.length - failures} analysed, ${failures} not analysed\n`);
    }
  }
  return failures === 0 ? EXIT_OK : EXIT_FAILURE;
}
