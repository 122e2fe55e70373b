/**
 * Asks the server first and falls back to the bundled core when the server does not know a
 * request (JSON-RPC "method not found"), remembering the answer so it is asked once per session.
 */
import { ErrorCodes, ResponseError } from "vscode-languageclient/node";

const unsupported = new Set<string>();

/** Runs `remote`; on "method not found" (now or earlier) runs `local` instead. Other errors propagate. */
export async function serverOrLocal<T>(method: string, remote: () => Promise<T>, local: () => T | Promise<T>): Promise<T> {
  if (unsupported.has(method)) return local();
  try {
    return await remote();
  } catch (error) {
    if (!isMethodNotFound(error)) throw error;
    unsupported.add(method);
    return local();
  }
}

/** Whether the server has answered "method not found" for `method` in this session. */
export function serverLacks(method: string): boolean {
  return unsupported.has(method);
}

function isMethodNotFound(error: unknown): boolean {
  return error instanceof ResponseError && error.code === ErrorCodes.MethodNotFound;
}
