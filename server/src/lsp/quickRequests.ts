/**
 * Quick requests first: long work (a large document's diagnostics, hover cards written ahead)
 * runs in slices, and between slices it gives way to the requests an editor waits on while the
 * user moves the cursor (hover, inlay hints, code actions). The transport tells this gate which
 * such requests have come in and which have been answered; long work waits while any is open.
 */
import type { DataCallback, Disposable, Message, MessageReader, MessageWriter } from "vscode-languageserver/node";

/** Requests a user waits on with the cursor still: answered before long work goes on. */
const QUICK_METHODS: ReadonlySet<string> = new Set([
  "textDocument/hover",
  "textDocument/inlayHint",
  "textDocument/codeAction",
  "codeAction/resolve",
]);

/** A quick request that takes longer than this no longer holds long work up. */
const LONGEST_HOLD_MS = 250;

/** What long work asks between slices. */
export interface LongWork {
  /**
   * Lets waiting messages be read, then resolves once no quick request is open (or the oldest
   * has been open for longer than a quick request should take).
   */
  giveWay(): Promise<void>;
}

/** The gate: told about messages by the transport, asked by long work. */
export interface QuickRequestGate extends LongWork {
  /** A message came in (after the life-cycle gate let it through). */
  received(message: Message): void;
  /** A message went out. */
  sent(message: Message): void;
  /** Quick requests received and not answered yet. */
  readonly open: number;
}

export function createQuickRequestGate(now: () => number = () => performance.now()): QuickRequestGate {
  // Request id -> when it came in.
  const openRequests = new Map<string | number, number>();
  let waiters: (() => void)[] = [];
  const release = (): void => {
    const waiting = waiters;
    waiters = [];
    for (const resume of waiting) resume();
  };
  /** Milliseconds until the oldest open request stops holding long work up; 0 when none holds it. */
  const holdLeft = (): number => {
    let oldest = Infinity;
    for (const since of openRequests.values()) oldest = Math.min(oldest, since);
    return oldest === Infinity ? 0 : Math.max(0, oldest + LONGEST_HOLD_MS - now());
  };
  return {
    received(message) {
      const { method, id } = message as { method?: unknown; id?: unknown };
      if (typeof method !== "string" || !QUICK_METHODS.has(method)) return;
      if (typeof id === "string" || typeof id === "number") openRequests.set(id, now());
    },
    sent(message) {
      const { method, id } = message as { method?: unknown; id?: unknown };
      // A response: an id and no method. Answers to refused and cancelled requests count too.
      if (method !== undefined || (typeof id !== "string" && typeof id !== "number")) return;
      if (openRequests.delete(id) && openRequests.size === 0) release();
    },
    get open() {
      return openRequests.size;
    },
    async giveWay() {
      // A turn of the event loop: bytes that came in meanwhile are read and their requests queued.
      await new Promise((resolve) => setImmediate(resolve));
      for (let left = holdLeft(); left > 0; left = holdLeft()) {
        await new Promise<void>((resume) => {
          const timer = setTimeout(finish, left);
          function finish(): void {
            clearTimeout(timer);
            waiters = waiters.filter((waiter) => waiter !== finish);
            resume();
          }
          waiters.push(finish);
        });
      }
    },
  };
}

/** `reader` telling `gate` about every message it passes on. */
export function watchedReader(reader: MessageReader, gate: QuickRequestGate): MessageReader {
  return {
    onError: reader.onError,
    onClose: reader.onClose,
    onPartialMessage: reader.onPartialMessage,
    listen(callback: DataCallback): Disposable {
      return reader.listen((message) => {
        gate.received(message);
        callback(message);
      });
    },
    dispose() {
      reader.dispose();
    },
  };
}

/** `writer` telling `gate` about every message it writes. */
export function watchedWriter(writer: MessageWriter, gate: QuickRequestGate): MessageWriter {
  return {
    onError: writer.onError,
    onClose: writer.onClose,
    write(message) {
      gate.sent(message);
      return writer.write(message);
    },
    end() {
      writer.end();
    },
    dispose() {
      writer.dispose();
    },
  };
}
