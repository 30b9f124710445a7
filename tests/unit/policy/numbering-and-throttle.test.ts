import { describe, expect, it } from "vitest";
import { formatLabNumber, parseLabNumber, sequenceKey } from "@/lib/numbering/lab-number";
import { blockSecondsAfter, FREE_FAILURES, MAX_BLOCK_S } from "@/lib/policy/sign-in-throttle";

describe("lab numbers", () => {
  it("formats kind letter, two-digit year and a five-digit counter", () => {
    expect(formatLabNumber("roll", 2026, 42)).toBe("R26-00042");
    expect(formatLabNumber("certificate", 2031, 7)).toBe("Q31-00007");
    expect(formatLabNumber("run", 2026, 123456)).toBe("T26-123456");
    expect(sequenceKey("specimen", 2026)).toBe("specimen-2026");
  });

  it("refuses counters that are not positive integers", () => {
    expect(() => formatLabNumber("roll", 2026, 0)).toThrow(/positive integer/);
    expect(() => formatLabNumber("roll", 2026, 1.5)).toThrow(/positive integer/);
  });

  it("reads a typed or scanned number back, whatever the case and spaces", () => {
    expect(parseLabNumber(" r26-00042 ")).toEqual({ kind: "roll", yy: 26, value: 42 });
    expect(parseLabNumber("P26-00001")).toEqual({ kind: "specimen", yy: 26, value: 1 });
    expect(parseLabNumber("X26-00001")).toBeNull();
    expect(parseLabNumber("R26-42")).toBeNull();
  });
});

describe("sign-in throttle", () => {
  it("lets the first few mistakes pass, then doubles the wait up to the cap", () => {
    for (let n = 0; n <= FREE_FAILURES; n++) expect(blockSecondsAfter(n)).toBe(0);
    expect(blockSecondsAfter(FREE_FAILURES + 1)).toBe(15);
    expect(blockSecondsAfter(FREE_FAILURES + 2)).toBe(30);
    expect(blockSecondsAfter(FREE_FAILURES + 3)).toBe(60);
    expect(blockSecondsAfter(100)).toBe(MAX_BLOCK_S);
  });
});
