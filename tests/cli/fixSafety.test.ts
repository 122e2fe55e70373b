// `lonepair check --fix` never loses data: links, owner, group and mode survive, a file written
// by another program meanwhile is left alone, and an interrupted run leaves no temporary file.
import { createHash } from "node:crypto";
import {
  appendFileSync,
  chmodSync,
  chownSync,
  linkSync,
  lstatSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  readlinkSync,
  statSync,
  symlinkSync,
  writeFileSync,
} from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { ensureBuilt, runCli, runCliAs, startCli } from "./cliRunner";

beforeAll(ensureBuilt);

const HEADER = "cylinder,species,formula,valence electrons\n";
// common practice: NF3 has 5 + 3 x 7 = 26 valence electrons, SF6 6 + 6 x 7 = 48
const WRONG_ROW = "KR-E-201,nitrogen trifluoride,NF3,24\n";
const FIXED_ROW = "KR-E-201,nitrogen trifluoride,NF3,26\n";
const GOOD_ROW = "KR-E-202,sulfur hexafluoride,SF6,48\n";
const BEFORE = HEADER + WRONG_ROW + GOOD_ROW;
const AFTER = HEADER + FIXED_ROW + GOOD_ROW;
const runningAsRoot = process.getuid?.() === 0;
/** Any user and group that are not root's, for files root hands over. */
const OTHER_UID = 4321;
const OTHER_GID = 4322;

function scratchFolder(): string {
  return mkdtempSync(join(tmpdir(), "lonepair-fix-"));
}

function temporaryFilesIn(folder: string): string[] {
  return readdirSync(folder).filter((name) => name.endsWith(".lonepair-tmp"));
}

/** A cylinder table of `rows` rows, one NF3 row in every 1,000 with 24 electrons. */
function bigTable(rows: number): string {
  const lines = [HEADER];
  for (let index = 0; index < rows; index++) {
    lines.push(index % 1000 === 3 ? `KR-${index},nitrogen trifluoride,NF3,24\n` : `KR-${index},nitrogen trifluoride,NF3,26\n`);
  }
  return lines.join("");
}

async function waitFor(condition: () => boolean, what: string): Promise<void> {
  for (let tries = 0; tries < 3000; tries++) {
    if (condition()) return;
    await new Promise((resolve) => setTimeout(resolve, 5));
  }
  throw new Error(`timed out waiting for ${what}`);
}

function sha256(path: string): string {
  return createHash("sha256").update(readFileSync(path)).digest("hex");
}

describe("check --fix and links", () => {
  it("fixes the target of a symbolic link named on the command line and keeps the link", () => {
    const folder = scratchFolder();
    mkdirSync(join(folder, "store"));
    writeFileSync(join(folder, "store", "cylinders.csv"), BEFORE);
    symlinkSync(join("store", "cylinders.csv"), join(folder, "current.csv"));

    const run = runCli(["check", "--fix", "current.csv"], folder);

    expect(run.stderr).toBe("");
    expect(lstatSync(join(folder, "current.csv")).isSymbolicLink()).toBe(true);
    expect(readlinkSync(join(folder, "current.csv"))).toBe(join("store", "cylinders.csv"));
    expect(readFileSync(join(folder, "store", "cylinders.csv"), "utf8")).toBe(AFTER);
    expect(temporaryFilesIn(folder)).toEqual([]);
    expect(temporaryFilesIn(join(folder, "store"))).toEqual([]);
  });

  it("fixes the target of a symbolic link found in a folder and keeps the link", () => {
    const folder = scratchFolder();
    const outside = scratchFolder();
    writeFileSync(join(outside, "cylinders.csv"), BEFORE);
    mkdirSync(join(folder, "notes"));
    symlinkSync(join(outside, "cylinders.csv"), join(folder, "notes", "cylinders.csv"));

    const run = runCli(["check", "--fix", "notes"], folder);

    expect(run.stdout).toContain("Fixed 1 finding in 1 file.");
    expect(lstatSync(join(folder, "notes", "cylinders.csv")).isSymbolicLink()).toBe(true);
    expect(readFileSync(join(outside, "cylinders.csv"), "utf8")).toBe(AFTER);
  });

  it("keeps a hard link: both names show the fixed text, still one file", () => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "cylinders.csv"), BEFORE);
    linkSync(join(folder, "cylinders.csv"), join(folder, "backup-name.csv"));
    const inode = statSync(join(folder, "cylinders.csv")).ino;

    runCli(["check", "--fix", "cylinders.csv"], folder);

    expect(readFileSync(join(folder, "cylinders.csv"), "utf8")).toBe(AFTER);
    expect(readFileSync(join(folder, "backup-name.csv"), "utf8")).toBe(AFTER);
    expect(statSync(join(folder, "cylinders.csv")).ino).toBe(inode);
    expect(statSync(join(folder, "backup-name.csv")).nlink).toBe(2);
    expect(temporaryFilesIn(folder)).toEqual([]);
  });
});

describe("check --fix keeps who owns the file and who may read it", () => {
  it.each([0o600, 0o640, 0o604, 0o664])("keeps mode %o", (mode) => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "cylinders.csv"), BEFORE);
    chmodSync(join(folder, "cylinders.csv"), mode);

    runCli(["check", "--fix", "cylinders.csv"], folder);

    expect(readFileSync(join(folder, "cylinders.csv"), "utf8")).toBe(AFTER);
    expect(statSync(join(folder, "cylinders.csv")).mode & 0o7777).toBe(mode);
  });

  it.runIf(runningAsRoot)("run by root, leaves another user's file with that user and group", () => {
    const folder = scratchFolder();
    writeFileSync(join(folder, "cylinders.csv"), BEFORE);
    chownSync(join(folder, "cylinders.csv"), OTHER_UID, OTHER_GID);
    chmodSync(join(folder, "cylinders.csv"), 0o640);

    runCli(["check", "--fix", "cylinders.csv"], folder);

    const after = statSync(join(folder, "cylinders.csv"));
    expect(readFileSync(join(folder, "cylinders.csv"), "utf8")).toBe(AFTER);
    expect([after.uid, after.gid, after.mode & 0o7777]).toEqual([OTHER_UID, OTHER_GID, 0o640]);
  });

  it.runIf(runningAsRoot)("run by a user who may write the file but not give it away, keeps its owner", () => {
    const nobody = 65534;
    const folder = scratchFolder();
    chownSync(folder, nobody, nobody);
    writeFileSync(join(folder, "cylinders.csv"), BEFORE);
    // Owned by someone else, writable through the group the fixing user is in.
    chownSync(join(folder, "cylinders.csv"), OTHER_UID, nobody);
    chmodSync(join(folder, "cylinders.csv"), 0o664);

    const run = runCliAs(nobody, nobody, ["check", "--fix", "cylinders.csv"], folder);

    expect(run.stderr).toBe("");
    const after = statSync(join(folder, "cylinders.csv"));
    expect(readFileSync(join(folder, "cylinders.csv"), "utf8")).toBe(AFTER);
    expect([after.uid, after.gid, after.mode & 0o7777]).toEqual([OTHER_UID, nobody, 0o664]);
    expect(temporaryFilesIn(folder)).toEqual([]);
  });
});

describe("check --fix while the file or the process is disturbed", () => {
  it("leaves a file alone that another program appended to during the fix, and says so", async () => {
    const folder = scratchFolder();
    const path = join(folder, "cylinders.csv");
    writeFileSync(path, bigTable(300_000));
    const appended = "KR-APPENDED,sulfur hexafluoride,SF6,48\n";

    const started = startCli(["check", "--fix", "cylinders.csv"], folder);
    // The temporary file appears with the first fix; the run is then held still while the
    // other program writes, so the append surely lands between the reading and the replacing.
    await waitFor(() => temporaryFilesIn(folder).length > 0, "the temporary file");
    process.kill(started.pid, "SIGSTOP");
    expect(temporaryFilesIn(folder), "the fix finished before the append could be made").toHaveLength(1);
    const before = readFileSync(path, "utf8");
    appendFileSync(path, appended);
    process.kill(started.pid, "SIGCONT");
    const run = await started.ended;

    expect(readFileSync(path, "utf8")).toBe(before + appended);
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("cylinders.csv: not fixed: the file changed while it was being checked");
    expect(temporaryFilesIn(folder)).toEqual([]);
  });

  it.each(["SIGTERM", "SIGINT"] as const)("ended by %s during a fix, leaves the original and no temporary file", async (signal) => {
    const folder = scratchFolder();
    const path = join(folder, "cylinders.csv");
    writeFileSync(path, bigTable(300_000));
    const hashBefore = sha256(path);

    const started = startCli(["check", "--fix", "cylinders.csv"], folder);
    await waitFor(() => temporaryFilesIn(folder).length > 0, "the temporary file");
    process.kill(started.pid, signal);
    const run = await started.ended;

    // Ended by the signal itself (so a shell sees 128 + its number), not a normal exit.
    expect(run.signal).toBe(signal);
    expect(temporaryFilesIn(folder)).toEqual([]);
    expect(sha256(path)).toBe(hashBefore);
  });
});
