/**
 * A one-line progress indicator on stderr for long runs: shown only on a terminal (never when
 * stderr is piped or in CI logs), redrawn at most ten times a second, erased at the end.
 */

export interface ProgressIndicator {
  /** Work has moved on: `done` of `total` bytes, now in `file`. */
  update(done: number, total: number, file: string): void;
  /** Erases the line. */
  finish(): void;
}

const REDRAW_MILLISECONDS = 100;

/** An indicator writing to `write`; a silent one when `enabled` is false. */
export function progressIndicator(enabled: boolean, write: (text: string) => void, label: string): ProgressIndicator {
  if (!enabled) return { update: () => undefined, finish: () => undefined };
  let lastDrawn = 0;
  let drawn = false;
  return {
    update(done, total, file) {
      const now = Date.now();
      if (now - lastDrawn < REDRAW_MILLISECONDS) return;
      lastDrawn = now;
      drawn = true;
      const percent = total > 0 ? Math.min(100, Math.floor((done / total) * 100)) : 100;
      const shown = file.length > 50 ? `...${file.slice(-47)}` : file;
      write(`\r\u001b[K${label}: ${percent}% (${megabytes(done)} of ${megabytes(total)} MB) ${shown}`);
    },
    finish() {
      if (drawn) write("\r\u001b[K");
    },
  };
}

function megabytes(bytes: number): string {
  return (bytes / (1024 * 1024)).toFixed(1);
}

/** Worth showing: a terminal, and enough work that a silent wait would worry someone. */
export function wantsProgress(stderrIsTerminal: boolean, environment: NodeJS.ProcessEnv, totalBytes: number, files: number): boolean {
  if (!stderrIsTerminal || environment.CI !== undefined) return false;
  return totalBytes >= 32 * 1024 * 1024 || files >= 200;
}
