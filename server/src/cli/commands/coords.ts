/**
 * `lonepair coords <species> [--format xyz|mol] [--output FILE]`: model 3D coordinates of one
 * species as XYZ or an MDL molfile, to standard output or a file.
 * Exit 0 written, 1 species not analysed, 2 usage or I/O error.
 */
import { writeFileSync } from "node:fs";
import { analyzeTyped, coordinateFileOf, shapeOf } from "../../../../shared/src/index";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, EXIT_USAGE, parseCommandLine, usageError } from "../cliCommand";

const FORMATS = ["xyz", "mol"] as const;
type CoordinateFormat = (typeof FORMATS)[number];

const CAUTION =
  "Model geometry from ideal VSEPR angles and covalent radii, not measured data; for handling, " +
  "follow the safety data sheet, local rules and licensed practice.";

const HELP = `Usage: lonepair coords [--format xyz|mol] [--output FILE] <species>

Builds model 3D coordinates for one species (a formula such as SF4 or "NH4+", an mhchem
span, a name, or a SMILES string after the marker smiles:, which keeps cis/trans) from its
Lewis structure: ideal VSEPR angles at every atom and bond lengths from covalent radii.
Hydrogens are explicit atoms.

Options:
  --format xyz|mol  XYZ (default) or MDL molfile V2000 with bonds and formal charges
  --output FILE     write to FILE instead of standard output
  --help            show this help

${CAUTION}

Exit status: 0 written, 1 species not analysed, 2 usage or file error.
`;

export const coordsCommand: CliCommand = {
  name: "coords",
  summary: "model 3D coordinates of a species as XYZ or MDL molfile",
  help: HELP,
  run: runCoords,
};

function runCoords(args: readonly string[], io: CliIo): number {
  const parsed = parseCommandLine(coordsCommand, args, io, { format: { type: "string" }, output: { type: "string" } });
  if (parsed.exit !== undefined) return parsed.exit;
  const format = (parsed.values.format ?? "xyz").toLowerCase();
  if (!FORMATS.includes(format as CoordinateFormat)) {
    return usageError(coordsCommand, io, `unknown format '${parsed.values.format}': use xyz or mol.`);
  }
  if (parsed.positionals.length !== 1) {
    return usageError(coordsCommand, io, `give exactly one species (got ${parsed.positionals.length}); quote names with spaces.`);
  }
  const output = parsed.values.output;
  if (output !== undefined && output.trim() === "") return usageError(coordsCommand, io, "--output needs a file name.");

  const [speciesText] = parsed.positionals;
  const result = analyzeTyped(speciesText);
  if (!result.ok) {
    io.writeError(`lonepair coords: ${speciesText}: ${result.problem.message}\n`);
    return EXIT_FAILURE;
  }
  const analysis = result.value;
  // The one model every edge uses, so the file keeps cis/trans and matches the hover's point group.
  const file = coordinateFileOf(analysis, format === "mol" ? "molfile" : "xyz");
  if (!file.ok) {
    io.writeError(`lonepair coords: ${speciesText}: ${file.message}\n`);
    return EXIT_FAILURE;
  }
  const text = file.value.text;
  const atomCount = shapeOf(analysis).coordinates.atoms.length;

  if (output === undefined) {
    io.writeOut(text);
    return EXIT_OK;
  }
  try {
    writeFileSync(output, text, "utf8");
  } catch (error) {
    io.writeError(`lonepair coords: cannot write ${output}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}\n`);
    return EXIT_USAGE;
  }
  io.writeOut(
    `Wrote ${atomCount} atoms of ${analysis.reading.formula} to ${output} (${format === "mol" ? "MDL molfile" : "XYZ"}).\n${CAUTION}\n`,
  );
  return EXIT_OK;
}
