// The analysis memo stays within its budget, keeps what is still being asked for, and forgets the
// oldest unused entries first.
import { describe, expect, it } from "vitest";
import { boundedMemo } from "../shared/src/chemistry/boundedMemo";

describe("bounded memo", () => {
  it("never holds more than its budget of entries", () => {
    const memo = boundedMemo<number>(100);
    for (let index = 0; index < 10_000; index++) memo.set(`k${index}`, index);
    const kept = Array.from({ length: 10_000 }, (_, index) => memo.get(`k${index}`)).filter((value) => value !== undefined);
    expect(kept.length).toBeLessThanOrEqual(100);
    expect(kept.length).toBeGreaterThanOrEqual(50);
    // The newest are the ones kept.
    expect(memo.get("k9999")).toBe(9999);
    expect(memo.get("k0")).toBeUndefined();
  });

  it("keeps an entry that is asked for again while others come and go", () => {
    const memo = boundedMemo<string>(10);
    memo.set("SF4", "seesaw");
    for (let index = 0; index < 1_000; index++) {
      memo.set(`X${index}`, "other");
      expect(memo.get("SF4")).toBe("seesaw");
    }
  });

  it("weighs entries by the given measure", () => {
    // Long keys (large molecules) use the budget up sooner than short ones.
    const memo = boundedMemo<number>(1_000, (key) => key.length);
    for (let index = 0; index < 100; index++) memo.set(`${"C".repeat(99)}${index % 10}${index}`, index);
    const kept = Array.from({ length: 100 }, (_, index) => memo.get(`${"C".repeat(99)}${index % 10}${index}`)).filter(
      (v) => v !== undefined,
    );
    expect(kept.length).toBeLessThanOrEqual(10);
    expect(kept.length).toBeGreaterThanOrEqual(4);
  });
});
