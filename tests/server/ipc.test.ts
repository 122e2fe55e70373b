/**
 * The VS Code client starts the server with `--node-ipc`; the same features answer there.
 */
import { fork } from "node:child_process";
import { describe, expect, it } from "vitest";
import {
  DidOpenTextDocumentNotification,
  ExitNotification,
  HoverRequest,
  IPCMessageReader,
  IPCMessageWriter,
  InitializeRequest,
  InitializedNotification,
  ShutdownRequest,
  createProtocolConnection,
  type MarkupContent,
} from "vscode-languageserver-protocol/node";
import { FULL_CAPABILITIES, SERVER_PATH, fixtureUri } from "./lspSession";

describe("over node IPC", () => {
  it("initializes, hovers and exits cleanly", async () => {
    const child = fork(SERVER_PATH, ["--node-ipc"], { stdio: ["ignore", "ignore", "pipe", "ipc"] });
    const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
    const connection = createProtocolConnection(new IPCMessageReader(child), new IPCMessageWriter(child));
    connection.listen();
    try {
      const result = await connection.sendRequest(InitializeRequest.type, {
        processId: process.pid,
        rootUri: null,
        capabilities: FULL_CAPABILITIES,
      });
      expect(result.capabilities.hoverProvider).toBe(true);
      await connection.sendNotification(InitializedNotification.type, {});
      const uri = fixtureUri("notebook/ipc.md");
      await connection.sendNotification(DidOpenTextDocumentNotification.type, {
        textDocument: { uri, languageId: "markdown", version: 1, text: "Bay C keeps XeF4 for the etch trials.\n" },
      });
      const hover = await connection.sendRequest(HoverRequest.type, { textDocument: { uri }, position: { line: 0, character: 13 } });
      // common practice: XeF4 is AX4E2, square planar
      expect((hover?.contents as MarkupContent).value).toContain("square planar");
      await connection.sendRequest(ShutdownRequest.type);
      await connection.sendNotification(ExitNotification.type);
      expect(await exited).toBe(0);
    } finally {
      connection.dispose();
      if (child.exitCode === null) child.kill();
    }
  });
});
