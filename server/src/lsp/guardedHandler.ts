/**
 * Wraps a request handler so that a thrown error or a cancelled request is answered with an
 * empty result and a log line, never a crashed server.
 */
import type { CancellationToken } from "vscode-languageserver";

/** Where the server writes log lines (the connection's console in production). */
export interface ServerLog {
  error(message: string): void;
  info(message: string): void;
}

/**
 * Returns a handler that yields to the event loop first (so a pending cancellation can
 * arrive), then runs `handler`, and answers `fallback` on cancellation or error.
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
      if (token.isCancellationRequested) return fallback;
      const result = await handler(params, token);
      return token.isCancellationRequested ? fallback : result;
    } catch (error) {
      log.error(`lonepair: ${name} failed: ${describeError(error)}`);
      return fallback;
    }
  };
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
