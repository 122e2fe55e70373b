/**
 * Writes a fixed file without losing anything. The new content goes to a temporary file beside
 * the file, batch by batch (the bytes before the first change are copied from the original), and
 * replaces the original only when complete, so a reader never sees half a file and a crash or a
 * signal leaves the original as it was.
 *
 * What the replacement keeps:
 * - Changes made meanwhile: the file is replaced only if it is still exactly what was read (same
 *   size, modification time, inode and content hash, checked just before); otherwise nothing is
 *   written and `FileChangedError` says so. The hash is checked first, then the cheap signs once
 *   more, and the replacement follows with nothing in between: only a write landing between that
 *   last stat call and the rename could still be missed (see DEVELOPERS.md).
 * - Symbolic links: the link is left as it is and its target is fixed.
 * - Mode, owner and group: the temporary file gets them before it replaces the original.
 * - Hard links, and an owner the temporary file cannot be given (another user's file fixed by
 *   someone who may write it but not give files away): the new content is then copied into the
 *   original file itself, so every name keeps pointing at it and it keeps its owner. Until that
 *   copy is complete the temporary file holds the whole new content.
 */
import { createHash, randomBytes, type Hash } from "node:crypto";
import {
  closeSync,
  fsyncSync,
  ftruncateSync,
  openSync,
  readSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
  type BigIntStats,
} from "node:fs";
import { open, realpath, stat, type FileHandle } from "node:fs/promises";
import { basename, dirname, join } from "node:path";
import type { TemporaryFiles } from "./temporaryFiles";

/** Receives a file's batches in order; only a changed file is replaced. */
export interface FixedFileWriter {
  /**
   * The batch that starts at `byteOffset`: `original` as read from the file, `text` as it now
   * reads, and whether it changed. Every batch of the file must come, changed or not.
   */
  add(byteOffset: number, original: string, text: string, changed: boolean): Promise<void>;
  /** Replaces the original when anything changed; resolves to true when it did. */
  finish(): Promise<boolean>;
  /** Drops the temporary file, leaving the original untouched. */
  abort(): Promise<void>;
}

/** The file changed on disk between the reading and the writing: the fix was not written. */
export class FileChangedError extends Error {
  constructor() {
    super("not fixed: the file changed while it was being checked (another program wrote to it); nothing was written, run the check again");
    this.name = "FileChangedError";
  }
}

const COPY_CHUNK_BYTES = 1 << 20;
/** Room for the rest of a temporary file's name within the usual 255-byte limit. */
const NAME_CHARACTERS_KEPT = 80;

/**
 * A writer for the file at `path` (followed to its target when it is a symbolic link). Call it
 * before the file is read: what it records here is what "unchanged" is measured against.
 */
export async function fixedFileWriter(path: string, temporaries: TemporaryFiles): Promise<FixedFileWriter> {
  const target = await realpath(path);
  const before = await stat(target, { bigint: true });
  const temporaryPath = join(
    dirname(target),
    `.${basename(target).slice(0, NAME_CHARACTERS_KEPT)}.${process.pid}-${randomBytes(4).toString("hex")}.lonepair-tmp`,
  );
  const readHash: Hash = createHash("sha256");
  let readBytes = 0;
  let temporary: FileHandle | undefined;
  let writeInPlace = before.nlink > 1n;

  const abort = async (): Promise<void> => {
    if (!temporary) return;
    await temporary.close().catch(() => undefined);
    temporary = undefined;
    removeTemporary(temporaryPath, temporaries);
  };

  const start = async (byteOffset: number): Promise<FileHandle> => {
    const mode = Number(before.mode) & 0o7777;
    temporaries.add(temporaryPath);
    const handle = await open(temporaryPath, "wx", 0o600);
    temporary = handle;
    if (Number(before.uid) !== process.getuid?.() || Number(before.gid) !== process.getgid?.()) {
      // Giving a file to another owner takes root: without that, the original is written in place.
      await handle.chown(Number(before.uid), Number(before.gid)).catch(() => {
        writeInPlace = true;
      });
    }
    // After chown, which may clear set-user-id bits; and the umask may have narrowed the mode.
    await handle.chmod(mode);
    await copyBytes(target, handle, byteOffset);
    return handle;
  };

  return {
    async add(byteOffset, original, text, changed) {
      readHash.update(original, "utf8");
      readBytes += Buffer.byteLength(original, "utf8");
      if (!temporary && !changed) return;
      try {
        const handle = temporary ?? (await start(byteOffset));
        await handle.write(text, null, "utf8");
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
        // From here on nothing awaits: no other work (nor a signal handler) runs in between.
        if (!unchangedSince(target, before, readBytes, readHash.digest("hex"))) throw new FileChangedError();
        // Hashing a large file takes a while: the cheap signs are checked once more right before
        // the replacement, so the window left is that of one stat call.
        if (!sameSigns(target, before, readBytes)) throw new FileChangedError();
        if (writeInPlace) {
          // The temporary file goes only once the copy is complete and on disk.
          copyInto(temporaryPath, target);
          removeTemporary(temporaryPath, temporaries);
        } else {
          renameSync(temporaryPath, target);
          temporaries.forget(temporaryPath);
        }
        return true;
      } catch (error) {
        await abort();
        removeTemporary(temporaryPath, temporaries);
        throw error;
      }
    },
    abort,
  };
}

function removeTemporary(path: string, temporaries: TemporaryFiles): void {
  try {
    unlinkSync(path);
  } catch {
    // Never created, or already gone.
  }
  temporaries.forget(path);
}

/** True when `path` is still the file that was read: same file, size, time and content. */
function unchangedSince(path: string, before: BigIntStats, readBytes: number, readHash: string): boolean {
  return sameSigns(path, before, readBytes) && hashOf(path) === readHash;
}

/** True when `path` is still the same file, of the size read, with the same modification and change times. */
function sameSigns(path: string, before: BigIntStats, readBytes: number): boolean {
  let now: BigIntStats;
  try {
    now = statSync(path, { bigint: true });
  } catch {
    return false;
  }
  const sameFile = now.ino === before.ino && now.dev === before.dev;
  const sameSize = now.size === before.size && now.size === BigInt(readBytes);
  return sameFile && sameSize && now.mtimeNs === before.mtimeNs && now.ctimeNs === before.ctimeNs;
}

function hashOf(path: string): string {
  const hash = createHash("sha256");
  const descriptor = openSync(path, "r");
  try {
    const buffer = Buffer.allocUnsafe(COPY_CHUNK_BYTES);
    for (;;) {
      const bytesRead = readSync(descriptor, buffer, 0, buffer.length, null);
      if (bytesRead === 0) break;
      hash.update(buffer.subarray(0, bytesRead));
    }
  } finally {
    closeSync(descriptor);
  }
  return hash.digest("hex");
}

/** Copies the whole of `source` over `target`, in place: same inode, links, owner and mode. */
function copyInto(source: string, target: string): void {
  const from = openSync(source, "r");
  try {
    const to = openSync(target, "r+");
    try {
      const buffer = Buffer.allocUnsafe(COPY_CHUNK_BYTES);
      let position = 0;
      for (;;) {
        const bytesRead = readSync(from, buffer, 0, buffer.length, position);
        if (bytesRead === 0) break;
        let written = 0;
        while (written < bytesRead) written += writeSync(to, buffer, written, bytesRead - written, position + written);
        position += bytesRead;
      }
      ftruncateSync(to, position);
      fsyncSync(to);
    } finally {
      closeSync(to);
    }
  } finally {
    closeSync(from);
  }
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
      if (bytesRead === 0) throw new FileChangedError();
      await target.write(buffer, 0, bytesRead);
      copied += bytesRead;
    }
  } finally {
    await source.close();
  }
}
