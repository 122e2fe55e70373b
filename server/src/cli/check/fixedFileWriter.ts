/**
 * Writes a fixed file atomically: the new content goes to a temporary file in the same folder,
 * which then replaces the original with one rename, so a reader never sees half a file and a
 * crash leaves the original as it was. Nothing is created until the first change arrives; the
 * bytes before it are copied from the original, the rest is written batch by batch.
 */
import { randomBytes } from "node:crypto";
import { open, rename, stat, unlink, type FileHandle } from "node:fs/promises";
import { basename, dirname, join } from "node:path";

/** Receives a file's batches in order; only a changed file is replaced. */
export interface FixedFileWriter {
  /** The batch that starts at `byteOffset`: its text as it now reads, and whether it changed. */
  add(byteOffset: number, text: string, changed: boolean): Promise<void>;
  /** Replaces the original when anything changed; resolves to true when it did. */
  finish(): Promise<boolean>;
  /** Drops the temporary file, leaving the original untouched. */
  abort(): Promise<void>;
}

const COPY_CHUNK_BYTES = 1 << 20;

/** A writer for the file at `path`. */
export function fixedFileWriter(path: string): FixedFileWriter {
  const temporaryPath = join(dirname(path), `.${basename(path)}.${process.pid}-${randomBytes(4).toString("hex")}.lonepair-tmp`);
  let temporary: FileHandle | undefined;

  const abort = async (): Promise<void> => {
    if (!temporary) return;
    await temporary.close().catch(() => undefined);
    temporary = undefined;
    await unlink(temporaryPath).catch(() => undefined);
  };

  return {
    async add(byteOffset, text, changed) {
      if (!temporary && !changed) return;
      try {
        if (!temporary) {
          const mode = (await stat(path)).mode & 0o7777;
          temporary = await open(temporaryPath, "wx", mode);
          // The umask may have narrowed the mode; the fixed file keeps the original's.
          await temporary.chmod(mode);
          await copyBytes(path, temporary, byteOffset);
        }
        await temporary.write(text, null, "utf8");
      } catch (error) {
        await abort();
        throw error;
      }
    },
    async finish() {
      if (!temporary) return false;
      try {
        await temporary.sync();
        await temporary.close();
        temporary = undefined;
        await rename(temporaryPath, path);
        return true;
      } catch (error) {
        await abort();
        await unlink(temporaryPath).catch(() => undefined);
        throw error;
      }
    },
    abort,
  };
}

/** Copies the first `length` bytes of `path` to `target`. */
async function copyBytes(path: string, target: FileHandle, length: number): Promise<void> {
  if (length === 0) return;
  const source = await open(path, "r");
  try {
    const buffer = Buffer.allocUnsafe(Math.min(COPY_CHUNK_BYTES, length));
    let copied = 0;
    while (copied < length) {
      const { bytesRead } = await source.read(buffer, 0, Math.min(buffer.length, length - copied), copied);
      if (bytesRead === 0) throw new Error("the file became shorter while it was being fixed");
      await target.write(buffer, 0, bytesRead);
      copied += bytesRead;
    }
  } finally {
    await source.close();
  }
}
