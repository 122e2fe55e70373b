/**
 * A bare wire-level client for the tests of the protocol's rules: it writes chosen frames to
 * `node dist/server.js --stdio`, several in one write when the order of arrival matters, and
 * collects everything the server sends back. No handshake is done for you.
 */
import { spawn, type ChildProcessWithoutNullStreams } from "node:child_process";
import { StreamMessageReader, type Message, type ResponseMessage } from "vscode-languageserver-protocol/node";
import { SERVER_PATH } from "./lspSession";

export interface RawSession {
  readonly child: ChildProcessWithoutNullStreams;
  /** Every message the server sent, in order. */
  readonly received: Message[];
  /** Writes the messages as frames in a single write, so the server reads them together. */
  send(...messages: readonly object[]): void;
  /** The response to request `id`, waiting for it up to `timeoutMs`. */
  responseTo(id: number, timeoutMs?: number): Promise<ResponseMessage>;
  /** Resolves with the exit code. */
  exited(): Promise<number | null>;
  kill(): void;
}

/** One LSP frame: the header and the JSON body. */
export function frame(message: object): Buffer {
  const body = Buffer.from(JSON.stringify({ jsonrpc: "2.0", ...message }), "utf8");
  return Buffer.concat([Buffer.from(`Content-Length: ${body.length}\r\n\r\n`, "ascii"), body]);
}

export function startRawSession(): RawSession {
  const child = spawn(process.execPath, [SERVER_PATH, "--stdio"], { stdio: "pipe" });
  const received: Message[] = [];
  const waiters = new Set<() => void>();
  const exit = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  new StreamMessageReader(child.stdout).listen((message) => {
    received.push(message);
    for (const wake of waiters) wake();
  });
  child.stderr.resume();
  return {
    child,
    received,
    send(...messages) {
      child.stdin.write(Buffer.concat(messages.map(frame)));
    },
    responseTo(id, timeoutMs = 20_000) {
      return new Promise((resolve, reject) => {
        const find = (): ResponseMessage | undefined =>
          received.find((message): message is ResponseMessage => (message as ResponseMessage).id === id && !("method" in message));
        const found = find();
        if (found) return resolve(found);
        const timer = setTimeout(() => {
          waiters.delete(wake);
          reject(new Error(`no response to request ${id} within ${timeoutMs} ms`));
        }, timeoutMs);
        const wake = (): void => {
          const response = find();
          if (!response) return;
          clearTimeout(timer);
          waiters.delete(wake);
          resolve(response);
        };
        waiters.add(wake);
      });
    },
    exited: () => exit,
    kill() {
      if (child.exitCode === null) child.kill();
    },
  };
}
