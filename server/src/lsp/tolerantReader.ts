/**
 * A message reader for stdio that survives garbage on the wire (see frameDecoder.ts). The
 * library's own reader stops at a bad header until more bytes arrive, which can leave a good
 * request unanswered; this one keeps decoding everything it has.
 */
import {
  Disposable,
  Emitter,
  type DataCallback,
  type Message,
  type MessageReader,
  type PartialMessageInfo,
} from "vscode-languageserver/node";
import { createFrameDecoder } from "./frameDecoder";

/** Reads LSP frames from `input` (process.stdin in production). */
export function createTolerantReader(input: NodeJS.ReadableStream): MessageReader {
  const errors = new Emitter<Error>();
  const closes = new Emitter<void>();
  const partials = new Emitter<PartialMessageInfo>();
  const decoder = createFrameDecoder();
  let listening = false;

  return {
    onError: errors.event,
    onClose: closes.event,
    onPartialMessage: partials.event,
    listen(callback: DataCallback): Disposable {
      if (listening) throw new Error("listen may be called once");
      listening = true;
      const onData = (chunk: Buffer | string): void => {
        decoder.push(typeof chunk === "string" ? Buffer.from(chunk, "utf8") : chunk);
        for (let frame = decoder.next(); frame; frame = decoder.next()) {
          if (frame.kind === "error") errors.fire(frame.error);
          else callback(frame.message as unknown as Message);
        }
      };
      const onError = (error: Error): void => errors.fire(error);
      const onClose = (): void => closes.fire();
      input.on("data", onData);
      input.on("error", onError);
      input.on("close", onClose);
      input.on("end", onClose);
      return Disposable.create(() => {
        input.off("data", onData);
        input.off("error", onError);
        input.off("close", onClose);
        input.off("end", onClose);
      });
    },
    dispose() {
      errors.dispose();
      closes.dispose();
      partials.dispose();
    },
  };
}
