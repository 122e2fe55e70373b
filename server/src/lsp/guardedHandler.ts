/**
 * Wraps a request handler so that a thrown error is answered with an empty result and a log
 * line, never a crashed server, and a cancelled request with the protocol's RequestCancelled.
 */
import { LSPErrorCodes, ResponseError, type CancellationToken } from "vscode-languageserver";

/** Where the server writes log lines (the connection's console in production). */
export interface ServerLog {
  error(message: string): void;
  info(message: string): void;
}

/**
 * Returns a handler that yields to the event loop first (so a pending cancellation can
 * arrive), then runs `handler`. A cancelled request is answered with RequestCancelled (the
 * client then knows the result was never computed), an error with `fallback`.
 */
export function guarded<Params, Result>(
  log: ServerLog,
  name: string,
  fallback: Result,
  handler: (params: Params, token: CancellationToken) => Result | Promise<Result>,
): (params: Params, token: CancellationToken) => Promise<Result> {
  return async (params, token) => {
    try {
      await yieldToEventLoop();
      if (token.isCancellationRequested) return cancelled(name);
      const result = await handler(params, token);
      return token.isCancellationRequested ? cancelled(name) : result;
    } catch (error) {
      // A protocol error (the cancellation above) is the answer itself, not a failure.
      if (error instanceof ResponseError) throw error;
      log.error(`lonepair: ${name} failed: ${describeError(error)}`);
      return fallback;
    }
  };
}

function cancelled(name: string): never {
  throw new ResponseError(LSPErrorCodes.RequestCancelled, `lonepair: ${name} was cancelled`);
}

/** Runs a notification handler; an error is logged and swallowed. */
export function guardedNotification<Params>(
  log: ServerLog,
  name: string,
  handler: (params: Params) => void | Promise<void>,
): (params: Params) => Promise<void> {
  return async (params) => {
    try {
      await handler(params);
    } catch (error) {
      log.error(`lonepair: ${name} failed: ${describeError(error)}`);
    }
  };
}

/** Lets queued messages (a `$/cancelRequest`, a newer edit) be read before heavy work. */
export function yieldToEventLoop(): Promise<void> {
  return new Promise((resolve) => setImmediate(resolve));
}

/** One line for the log, with the stack when there is one. */
export function describeError(error: unknown): string {
  if (error instanceof Error) return error.stack ?? `${error.name}: ${error.message}`;
  return String(error);
}
