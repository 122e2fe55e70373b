/**
 * Enforces the protocol's life cycle in front of the connection: nothing but `initialize`
 * (and `exit`) before the server is initialized, one `initialize` only, and nothing but
 * `exit` after `shutdown`. Refused requests are answered here and never reach a handler.
 */
import {
  Disposable,
  ErrorCodes,
  type DataCallback,
  type Message,
  type MessageReader,
  type MessageWriter,
} from "vscode-languageserver/node";

/** Where the server stands in the life cycle. */
export type LifecycleState = "waiting-for-initialize" | "running" | "shut-down";

/** What the gate does with one incoming message. */
export type GateDecision =
  { readonly kind: "forward" } | { readonly kind: "drop" } | { readonly kind: "refuse"; readonly code: number; readonly message: string };

/** The life cycle as a small state machine, kept apart from I/O so the rules read in one place. */
export interface Lifecycle {
  readonly state: LifecycleState;
  /** Decides about one message and moves the state on. */
  decide(message: Message): GateDecision;
}

/** A fresh life cycle, waiting for `initialize`. */
export function createLifecycle(): Lifecycle {
  let state: LifecycleState = "waiting-for-initialize";
  return {
    get state() {
      return state;
    },
    decide(message) {
      const method = (message as { method?: unknown }).method;
      // Responses to our own requests (configuration, registration) always pass.
      if (typeof method !== "string") return { kind: "forward" };
      const id = (message as { id?: unknown }).id;
      const isRequest = typeof id === "string" || typeof id === "number";
      if (method === "exit") return { kind: "forward" };
      if (!isRequest) return state === "running" ? { kind: "forward" } : { kind: "drop" };
      if (state === "shut-down") {
        return {
          kind: "refuse",
          code: ErrorCodes.InvalidRequest,
          message: `The server has been shut down; "${method}" is refused. Send "exit".`,
        };
      }
      if (method === "initialize") {
        if (state === "running") return { kind: "refuse", code: ErrorCodes.InvalidRequest, message: "The server is already initialized." };
        state = "running";
        return { kind: "forward" };
      }
      if (state === "waiting-for-initialize") {
        return {
          kind: "refuse",
          code: ErrorCodes.ServerNotInitialized,
          message: `The server is not initialized yet; "${method}" is refused.`,
        };
      }
      if (method === "shutdown") state = "shut-down";
      return { kind: "forward" };
    },
  };
}

/**
 * Wraps `reader` so that messages the life cycle refuses are answered on `writer` (with the
 * request's id) and dropped, and everything else is passed on unchanged.
 */
export function gatedReader(reader: MessageReader, writer: MessageWriter, lifecycle: Lifecycle = createLifecycle()): MessageReader {
  return {
    onError: reader.onError,
    onClose: reader.onClose,
    onPartialMessage: reader.onPartialMessage,
    listen(callback: DataCallback): Disposable {
      return reader.listen((message) => {
        const decision = lifecycle.decide(message);
        if (decision.kind === "forward") return callback(message);
        if (decision.kind === "drop") return;
        const id = (message as { id?: string | number }).id ?? null;
        writer.write({ jsonrpc: "2.0", id, error: { code: decision.code, message: decision.message } } as Message).catch(() => undefined);
      });
    },
    dispose() {
      reader.dispose();
    },
  };
}
