/**
 * `lonepair draw --lewis|--shape <species>`: a picture of one species as an SVG document, to
 * standard output or a file, for scripted reports. Each picture kind is one switch; exactly one
 * is given.
 * Exit 0 drawn, 1 species not analysed or not drawable, 2 usage or I/O error.
 */
import { writeFileSync } from "node:fs";
import {
  analyzeTyped,
  DIAGRAM_THEMES,
  lewisDiagram,
  MODEL_CAUTION,
  shapePictureSvg,
  type DiagramTheme,
  type SpeciesAnalysis,
} from "../../../../shared/src/index";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, EXIT_USAGE, parseCommandLine, usageError } from "../cliCommand";

/** What every picture kind gets from the command line. */
interface DrawRequest {
  readonly form?: number;
  readonly theme: DiagramTheme;
  /** Pixels; the picture kind's own size when not given. */
  readonly width?: number;
  readonly height?: number;
  /** Lone pairs as empty electron sites rather than lobes. */
  readonly electronView: boolean;
}

type Drawn = { readonly ok: true; readonly svg: string; readonly note?: string } | { readonly ok: false; readonly message: string };

/** One kind of picture: its switch and how it is drawn from an analysis. */
interface DrawMode {
  readonly option: string;
  readonly summary: string;
  draw(analysis: SpeciesAnalysis, request: DrawRequest): Drawn;
}

const DRAW_MODES: readonly DrawMode[] = [
  {
    option: "lewis",
    summary: "the Lewis structure: bonds, lone pairs, formal charges",
    draw(analysis, request) {
      const result = lewisDiagram(analysis, { form: request.form, theme: request.theme });
      if (!result.ok) return result;
      const diagram = result.diagram;
      const note =
        diagram.equivalentStructures > 1
          ? `structure ${diagram.form} of ${diagram.equivalentStructures} equivalent ones` +
            (diagram.drawableForms > 1 ? `; draw another with --form 1..${diagram.drawableForms}` : "")
          : undefined;
      return { ok: true, svg: `${diagram.svg}\n`, note };
    },
  },
  {
    option: "shape",
    summary: "the ball-and-stick model as the 3D view starts: lone pairs, bond angles",
    draw(analysis, request) {
      const svg = shapePictureSvg(analysis, {
        width: request.width,
        height: request.height,
        mode: request.electronView ? "electron" : "molecular",
        theme: request.theme,
      });
      return svg === undefined ? { ok: false, message: "no 3D model could be built for this species." } : { ok: true, svg: `${svg}\n` };
    },
  },
];

const HELP = `Usage: lonepair draw --lewis|--shape [options] <species>

Draws one species (a formula such as SF4 or "NO3-", an mhchem span, a name, or a SMILES
string after the marker smiles:) as an SVG picture on standard output, for reports:
  lonepair draw --lewis SF4 > sf4.svg
  lonepair draw --shape ClF3 > clf3-shape.svg

Pictures:
${DRAW_MODES.map((mode) => `  --${mode.option.padEnd(14)}${mode.summary}`).join("\n")}

Options:
  --form N          --lewis: which of several equivalent structures to draw (default 1)
  --width N         --shape: width in pixels, 40 to 4000 (default 480)
  --height N        --shape: height in pixels, 40 to 4000 (default 400)
  --electron        --shape: lone pairs as empty electron sites (the electron geometry)
  --theme NAME      plate (default): dark ink on a white card, reads on any page;
                    light or dark: transparent, for a page of that kind;
                    current: the colour of the surrounding text, for inline SVG
  --output FILE     write to FILE instead of standard output
  --help            show this help

${MODEL_CAUTION}

Exit status: 0 drawn, 1 species not analysed or not drawable, 2 usage or file error.
`;

export const drawCommand: CliCommand = {
  name: "draw",
  summary: "an SVG picture of a species (--lewis: Lewis structure, --shape: ball-and-stick)",
  help: HELP,
  run: runDraw,
};

function runDraw(args: readonly string[], io: CliIo): number {
  const options = {
    form: { type: "string" },
    theme: { type: "string" },
    output: { type: "string" },
    width: { type: "string" },
    height: { type: "string" },
    electron: { type: "boolean" },
    ...Object.fromEntries(DRAW_MODES.map((mode) => [mode.option, { type: "boolean" } as const])),
  } as const;
  const parsed = parseCommandLine(drawCommand, args, io, options);
  if (parsed.exit !== undefined) return parsed.exit;
  const values = parsed.values as Readonly<Record<string, string | boolean | undefined>>;
  const chosen = DRAW_MODES.filter((mode) => values[mode.option] === true);
  const switches = DRAW_MODES.map((mode) => `--${mode.option}`).join(" or ");
  if (chosen.length !== 1) return usageError(drawCommand, io, `choose one picture: ${switches}.`);
  if (parsed.positionals.length !== 1) {
    return usageError(drawCommand, io, `give exactly one species (got ${parsed.positionals.length}); quote names with spaces.`);
  }
  const theme = (parsed.values.theme ?? "plate").toLowerCase();
  if (!DIAGRAM_THEMES.includes(theme as DiagramTheme)) {
    return usageError(drawCommand, io, `unknown theme '${parsed.values.theme}': use ${DIAGRAM_THEMES.join(", ")}.`);
  }
  let form: number | undefined;
  if (parsed.values.form !== undefined) {
    form = Number(parsed.values.form);
    if (!/^\d+$/.test(parsed.values.form.trim()) || form < 1)
      return usageError(drawCommand, io, `--form needs a whole number from 1 (got '${parsed.values.form}').`);
  }
  const width = pixelOption(parsed.values.width);
  const height = pixelOption(parsed.values.height);
  if (width === null || height === null) return usageError(drawCommand, io, "--width and --height take whole pixels from 40 to 4000.");
  const output = parsed.values.output;
  if (output !== undefined && output.trim() === "") return usageError(drawCommand, io, "--output needs a file name.");

  const [speciesText] = parsed.positionals;
  const result = analyzeTyped(speciesText);
  if (!result.ok) {
    io.writeError(`lonepair draw: ${speciesText}: ${result.problem.message}\n`);
    return EXIT_FAILURE;
  }
  const drawn = chosen[0].draw(result.value, {
    form,
    theme: theme as DiagramTheme,
    width,
    height,
    electronView: parsed.values.electron === true,
  });
  if (!drawn.ok) {
    io.writeError(`lonepair draw: ${speciesText}: ${drawn.message}\n`);
    return EXIT_FAILURE;
  }
  if (output === undefined) {
    io.writeOut(drawn.svg);
    if (drawn.note) io.writeError(`lonepair draw: ${result.value.reading.formula}: ${drawn.note}.\n`);
    return EXIT_OK;
  }
  try {
    writeFileSync(output, drawn.svg, "utf8");
  } catch (error) {
    io.writeError(`lonepair draw: cannot write ${output}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}\n`);
    return EXIT_USAGE;
  }
  const note = drawn.note ? ` (${drawn.note})` : "";
  io.writeOut(`Wrote the ${chosen[0].option} picture of ${result.value.reading.formula} to ${output}${note}.\n${MODEL_CAUTION}\n`);
  return EXIT_OK;
}

/** Undefined when not given, null when not a whole number of pixels in range. */
function pixelOption(value: string | undefined): number | undefined | null {
  if (value === undefined) return undefined;
  if (!/^\d+$/.test(value.trim())) return null;
  const pixels = Number(value.trim());
  return pixels >= 40 && pixels <= 4000 ? pixels : null;
}
