/**
 * Worker thread (bundled to dist/workerThread.js) for work that cannot be cut into slices: on one
 * large SMILES species that needs its 3D model (the hover card, for the polarity; the 3D view
 * model; the coordinate file), and the whole reading of a large broken JSON or YAML list. The
 * server's own thread meanwhile goes on answering every other request.
 */
import { parentPort } from "node:worker_threads";
import { analyzeSmiles, hoverMarkdown, wholeReadingOf } from "../../../shared/src/index";
import type { WorkerReply, WorkerRequest } from "./offThreadWork";
import { coordinatesAnswer, shapeModelAnswer } from "./speciesModelAnswers";

function answer(job: WorkerRequest): unknown {
  if (job.kind === "wholeReading") return wholeReadingOf(job.documentKind, job.text);
  const result = analyzeSmiles(job.smiles);
  if (!result.ok) return undefined;
  switch (job.kind) {
    case "card":
      return hoverMarkdown(result.value, job.options);
    case "shapeModel":
      return shapeModelAnswer(result.value);
    case "coordinates":
      return coordinatesAnswer(result.value, job.format);
  }
}

parentPort?.on("message", (job: WorkerRequest) => {
  let value: unknown;
  try {
    value = answer(job);
  } catch {
    // The server does the work itself when this answers nothing.
    value = undefined;
  }
  parentPort!.postMessage({ id: job.id, value } satisfies WorkerReply);
});
