/**
 * Work that cannot be cut into slices, done on a worker thread (see `workerThread.ts`) so that it
 * never holds up other requests: on one large SMILES species (its hover card, 3D view model or
 * coordinate file, each of which needs the 3D model), and the whole reading of a large JSON or
 * YAML list that a keystroke broke. One worker, started on first use, runs one job at a time; a cancelled
 * job waiting its turn is dropped, and a cancelled job that is running stops the worker (a new one
 * starts for the next job). Should the worker be missing or fail, the answer says so and the
 * caller does the work itself.
 */
import { existsSync } from "node:fs";
import { join } from "node:path";
import { Worker, type ResourceLimits } from "node:worker_threads";
import type { CancellationToken } from "vscode-languageserver";
import type { CoordinateFormat, HoverMarkdownOptions, SpeciesAnalysis, WholeReading } from "../../../shared/src/index";
import type { ServerLog } from "./guardedHandler";
import type { CoordinatesAnswer, ShapeModelAnswer } from "./speciesModelAnswers";

/** Species with more atoms than this (hydrogens included) are worked on off the main thread. */
export const OFF_THREAD_ATOMS = 300;

/** Whether work on `analysis` that needs its 3D model goes to the worker: a SMILES species past `OFF_THREAD_ATOMS`. */
export function isLargeSmiles(analysis: SpeciesAnalysis): boolean {
  return analysis.reading.notation === "smiles" && analysis.graph.atoms.length > OFF_THREAD_ATOMS;
}

/** One job for the worker, by what it asks for. */
export type OffThreadJob =
  | { readonly kind: "card"; readonly smiles: string; readonly options: HoverMarkdownOptions }
  | { readonly kind: "shapeModel"; readonly smiles: string }
  | { readonly kind: "coordinates"; readonly smiles: string; readonly format: CoordinateFormat }
  | { readonly kind: "wholeReading"; readonly documentKind: "json" | "yaml"; readonly text: string };

/** What each kind of job answers; undefined when the worker could not work it out. */
export interface OffThreadJobValue {
  readonly card: string | undefined;
  readonly shapeModel: ShapeModelAnswer | undefined;
  readonly coordinates: CoordinatesAnswer | undefined;
  readonly wholeReading: WholeReading | undefined;
}

/** A job as posted to the worker. */
export type WorkerRequest = OffThreadJob & { readonly id: number };

/** The worker's reply to job `id`. */
export interface WorkerReply {
  readonly id: number;
  readonly value: unknown;
}

/** How a job ended: done (with the worker's value), cancelled, or not run (do it yourself). */
export type OffThreadAnswer<T> =
  { readonly kind: "done"; readonly value: T } | { readonly kind: "cancelled" } | { readonly kind: "unavailable" };

export interface OffThreadWork {
  run<K extends OffThreadJob["kind"]>(
    job: Extract<OffThreadJob, { kind: K }>,
    token?: CancellationToken,
  ): Promise<OffThreadAnswer<OffThreadJobValue[K]>>;
  /** Starts the worker ahead of a job that may come (it takes a few hundred milliseconds to load). */
  warm(): void;
}

interface QueuedJob {
  readonly request: WorkerRequest;
  readonly settle: (answer: OffThreadAnswer<unknown>) => void;
  stopListening?: () => void;
}

/** `workerPath` defaults to the bundle beside the running server (dist/workerThread.js); `limits` bound the worker's heap. */
export function createOffThreadWork(
  log: ServerLog,
  workerPath = join(__dirname, "workerThread.js"),
  limits?: ResourceLimits,
): OffThreadWork {
  let worker: Worker | undefined;
  let running: QueuedJob | undefined;
  const queue: QueuedJob[] = [];
  let nextId = 0;

  const finish = (job: QueuedJob, answer: OffThreadAnswer<unknown>): void => {
    job.stopListening?.();
    job.settle(answer);
  };

  const start = (): Worker | undefined => {
    if (!existsSync(workerPath)) return undefined;
    const started = new Worker(workerPath, limits ? { resourceLimits: limits } : {});
    // The worker never keeps the server alive once the editor has gone.
    started.unref();
    started.on("message", (reply: WorkerReply) => {
      if (!running || running.request.id !== reply.id) return;
      const job = running;
      running = undefined;
      finish(job, { kind: "done", value: reply.value });
      next();
    });
    started.on("error", (error) => log.error(`lonepair: species worker failed: ${String(error)}`));
    started.on("exit", () => {
      if (worker !== started) return;
      worker = undefined;
      // The job it was running gets no answer from it: the caller works it out itself.
      const job = running;
      running = undefined;
      if (job) finish(job, { kind: "unavailable" });
      next();
    });
    return started;
  };

  const next = (): void => {
    if (running) return;
    const job = queue.shift();
    if (!job) return;
    worker ??= start();
    if (!worker) {
      finish(job, { kind: "unavailable" });
      next();
      return;
    }
    running = job;
    worker.postMessage(job.request);
  };

  const cancel = (job: QueuedJob): void => {
    const waitingAt = queue.indexOf(job);
    if (waitingAt >= 0) {
      queue.splice(waitingAt, 1);
      finish(job, { kind: "cancelled" });
      return;
    }
    if (running !== job) return;
    // A model being built cannot be interrupted from outside: stop the worker instead.
    running = undefined;
    finish(job, { kind: "cancelled" });
    const stopped = worker;
    worker = undefined;
    void stopped?.terminate();
    next();
  };

  return {
    warm() {
      worker ??= start();
    },
    run(job, token) {
      if (token?.isCancellationRequested) return Promise.resolve({ kind: "cancelled" });
      return new Promise((settle) => {
        const queued: QueuedJob = { request: { ...job, id: nextId++ }, settle: settle as QueuedJob["settle"] };
        if (token) {
          const listener = token.onCancellationRequested(() => cancel(queued));
          queued.stopListening = () => listener.dispose();
        }
        queue.push(queued);
        next();
      });
    },
  };
}
