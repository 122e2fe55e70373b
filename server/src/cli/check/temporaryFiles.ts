/**
 * The temporary files `check --fix` has open, so that an interrupted run (Ctrl-C, a CI job
 * cancelled with SIGTERM, a closed terminal) leaves none behind. The originals are never at
 * risk from an interruption: they are only replaced once a temporary file is complete.
 */
import { unlinkSync } from "node:fs";

/** Paths of temporary files in progress. */
export interface TemporaryFiles {
  add(path: string): void;
  /** The file was renamed into place or deleted: no longer ours to clean. */
  forget(path: string): void;
  /** Deletes every file still listed, at once (safe to call from a signal handler). */
  removeAll(): void;
}

/** An empty list of temporary files. */
export function temporaryFiles(): TemporaryFiles {
  const paths = new Set<string>();
  return {
    add: (path) => void paths.add(path),
    forget: (path) => void paths.delete(path),
    removeAll() {
      for (const path of paths) {
        try {
          unlinkSync(path);
        } catch {
          // Already gone.
        }
      }
      paths.clear();
    },
  };
}

const CLEANED_SIGNALS: readonly NodeJS.Signals[] = ["SIGINT", "SIGTERM", "SIGHUP"];

/**
 * Until the returned function is called, a signal that would end the process first deletes the
 * temporary files, then ends it by the same signal (so the exit status still says which).
 */
export function removeOnSignals(temporaries: TemporaryFiles): () => void {
  const uninstall = (): void => {
    for (const signal of CLEANED_SIGNALS) process.removeListener(signal, onSignal);
  };
  function onSignal(signal: NodeJS.Signals): void {
    temporaries.removeAll();
    uninstall();
    process.kill(process.pid, signal);
  }
  for (const signal of CLEANED_SIGNALS) process.on(signal, onSignal);
  return uninstall;
}
