/**
 * The whole reading of a large broken JSON or YAML list, done on a worker thread when the core
 * offers it (`AnalysedDocument.wholeReadWanted`), once per analysed version however many requests
 * wait for it (the diagnostics, the status bar's counts).
 */
import { CancellationTokenSource } from "vscode-languageserver";
import { wholeText } from "../../../shared/src/index";
import type { AnalysedDocument } from "./documentCache";
import type { OffThreadWork } from "./offThreadWork";

export interface WholeReadings {
  /**
   * When `analysed` waits on its whole reading, has it done on the worker and hands it in; false
   * when every caller waiting for it gave up (`stop()`) meanwhile. Should the worker be missing,
   * the reading is left to the core, which does it when the findings are asked for.
   */
  settle(analysed: AnalysedDocument, stop: () => boolean): Promise<boolean>;
  /** Loads the worker ahead of a reading that may come. */
  warm(): void;
}

/** How often a reading on the worker checks whether anyone still waits for it. */
const STALE_CHECK_MS = 20;

export function createWholeReadings(offThread: OffThreadWork): WholeReadings {
  const running = new WeakMap<AnalysedDocument, { readonly done: Promise<void>; readonly waiting: Set<() => boolean> }>();
  const start = (analysed: AnalysedDocument): { readonly done: Promise<void>; readonly waiting: Set<() => boolean> } | undefined => {
    const wanted = analysed.wholeReadWanted();
    if (!wanted || (analysed.kind !== "json" && analysed.kind !== "yaml")) return undefined;
    const waiting = new Set<() => boolean>();
    const giveUp = new CancellationTokenSource();
    // The reading stops once every caller has given up on this version.
    const watch = setInterval(() => {
      if ([...waiting].every((stop) => stop())) giveUp.cancel();
    }, STALE_CHECK_MS);
    const done = offThread
      .run({ kind: "wholeReading", documentKind: analysed.kind, text: wholeText(wanted.text) }, giveUp.token)
      .then((answer) => {
        if (answer.kind === "done" && answer.value) wanted.settle(answer.value);
      })
      .finally(() => {
        clearInterval(watch);
        giveUp.dispose();
        running.delete(analysed);
      });
    return { done, waiting };
  };
  return {
    async settle(analysed, stop) {
      let reading = running.get(analysed);
      if (!reading) {
        reading = start(analysed);
        if (!reading) return !stop();
        running.set(analysed, reading);
      }
      reading.waiting.add(stop);
      await reading.done;
      return !stop();
    },
    warm: () => offThread.warm(),
  };
}
