/**
 * Hover cards of large SMILES species written on a worker thread (see `cardWorker.ts`), so one
 * species never holds up other requests. One worker, started on first use; should it be missing or
 * fail, the answer is undefined and the caller writes the card itself.
 */
import { existsSync } from "node:fs";
import { join } from "node:path";
import { Worker } from "node:worker_threads";
import type { HoverMarkdownOptions } from "../../../shared/src/index";
import type { ServerLog } from "./guardedHandler";

/** Species with more atoms than this (hydrogens included) get their card off the main thread. */
export const OFF_THREAD_ATOMS = 300;

/** One card to write. */
export interface CardJob {
  readonly id: number;
  readonly smiles: string;
  readonly options: HoverMarkdownOptions;
}

export interface CardReply {
  readonly id: number;
  readonly card: string | undefined;
}

export interface OffThreadCards {
  /** The card of `smiles`, or undefined when the worker cannot give one. */
  card(smiles: string, options: HoverMarkdownOptions): Promise<string | undefined>;
}

/** `workerPath` defaults to the bundle beside the running server (dist/cardWorker.js). */
export function createOffThreadCards(log: ServerLog, workerPath = join(__dirname, "cardWorker.js")): OffThreadCards {
  let worker: Worker | undefined;
  let unavailable = false;
  let nextId = 0;
  const waiting = new Map<number, (card: string | undefined) => void>();
  const answerAll = (): void => {
    for (const resolve of waiting.values()) resolve(undefined);
    waiting.clear();
  };
  const start = (): Worker | undefined => {
    if (!existsSync(workerPath)) {
      unavailable = true;
      return undefined;
    }
    const started = new Worker(workerPath);
    // The worker never keeps the server alive once the editor has gone.
    started.unref();
    started.on("message", (reply: CardReply) => {
      waiting.get(reply.id)?.(reply.card);
      waiting.delete(reply.id);
    });
    started.on("error", (error) => log.error(`lonepair: hover worker failed: ${String(error)}`));
    started.on("exit", () => {
      worker = undefined;
      answerAll();
    });
    return started;
  };
  return {
    card(smiles, options) {
      if (unavailable) return Promise.resolve(undefined);
      worker ??= start();
      const running = worker;
      if (!running) return Promise.resolve(undefined);
      const id = nextId++;
      return new Promise((resolve) => {
        waiting.set(id, resolve);
        running.postMessage({ id, smiles, options } satisfies CardJob);
      });
    },
  };
}
