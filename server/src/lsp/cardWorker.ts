/**
 * Worker thread (bundled to dist/cardWorker.js) that writes the hover card of one large SMILES
 * species, whose 3D model (needed for the polarity) can take a noticeable time: the server's own
 * thread meanwhile goes on answering every other request.
 */
import { parentPort } from "node:worker_threads";
import { analyzeSmiles, hoverMarkdown } from "../../../shared/src/index";
import type { CardJob, CardReply } from "./offThreadCards";

parentPort?.on("message", (job: CardJob) => {
  let card: string | undefined;
  try {
    const result = analyzeSmiles(job.smiles);
    card = result.ok ? hoverMarkdown(result.value, job.options) : undefined;
  } catch {
    // The server writes the card itself when this answers nothing.
    card = undefined;
  }
  parentPort!.postMessage({ id: job.id, card } satisfies CardReply);
});
