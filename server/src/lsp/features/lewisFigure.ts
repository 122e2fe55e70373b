/**
 * `lonepair/lewisFigure`: the Lewis diagram of the species at a position (or of a species the
 * user typed) as a figure to save beside the document, with the markdown image that links it.
 * The figures folder is the document's `lonepair.figuresFolder` setting. Any LSP editor can
 * write the file and insert the link; the VS Code client does so as one undoable edit.
 */
import {
  DIAGRAM_THEMES,
  LEWIS_FIGURE_METHOD,
  analyzeTyped,
  figureLinkOffset,
  lewisFigureOf,
  type AnalysisResult,
  type DiagramTheme,
  type LewisFigureParams,
  type LewisFigureRequestResult,
} from "../../../../shared/src/index";
import { guarded } from "../guardedHandler";
import type { ServerContext } from "../serverContext";
import { describe, documentUri, speciesAt } from "./speciesRequests";

/** Longest typed species read: a name or a drug-sized SMILES, not a pasted document. */
const MAX_TYPED_LENGTH = 2_000;

export function registerLewisFigure(context: ServerContext): void {
  context.connection.onRequest(
    LEWIS_FIGURE_METHOD,
    guarded<unknown, LewisFigureRequestResult | null>(context.log, "Lewis figure", null, (params) => lewisFigure(context, params)),
  );
}

async function lewisFigure(context: ServerContext, params: unknown): Promise<LewisFigureRequestResult | null> {
  const uri = documentUri(params);
  if (uri === undefined) return null;
  const candidate = params as Partial<LewisFigureParams>;
  const form = Number.isInteger(candidate.form) && (candidate.form as number) >= 1 ? candidate.form : undefined;
  const theme = DIAGRAM_THEMES.includes(candidate.theme as DiagramTheme) ? candidate.theme : undefined;

  let described: Omit<LewisFigureRequestResult, "figure">;
  let analysis: AnalysisResult;
  if (typeof candidate.species === "string") {
    const typed = candidate.species.trim();
    if (typed === "") return null;
    if (typed.length > MAX_TYPED_LENGTH) {
      return {
        text: typed.slice(0, 40),
        problem: { code: "input-too-long", message: `A species is at most ${MAX_TYPED_LENGTH} characters.` },
      };
    }
    analysis = analyzeTyped(typed);
    described = analysis.ok ? { text: typed, formula: analysis.value.reading.formula } : { text: typed, problem: analysis.problem };
  } else {
    const found = await speciesAt(context, params);
    if (!found) return null;
    analysis = found.species.analysis;
    const text = found.document.getText();
    const linkOffset = figureLinkOffset(text, found.species.range.start, found.species.range.end);
    described = { ...describe(found.document, found.species), linkPosition: found.document.positionAt(linkOffset) };
  }
  if (!analysis.ok) return { ...described, problem: { code: analysis.problem.code, message: analysis.problem.message } };
  const settings = await context.settings.forUri(uri);
  const figure = lewisFigureOf(analysis.value, { form, theme, folder: settings.figuresFolder });
  return figure.ok ? { ...described, figure: figure.figure } : { ...described, problem: { code: "not-drawable", message: figure.message } };
}
