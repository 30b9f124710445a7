import { describe, expect, it } from "vitest";
import { LABEL_STOCK, LABELS_PER_SHEET, splitIntoSheets } from "@/lib/labels/label-stock";
import { parseLabelNumbers } from "@/lib/labels/parse-label-numbers";
import { createFifoLimiter } from "@/lib/server/pdf/create-fifo-limiter";

describe("parseLabelNumbers", () => {
  it("reads a typed or scanned list, normalised, in order, each once", () => {
    expect(parseLabelNumbers(" r26-00001, R26-00002;C26-00003\nP26-00004  R26-00001 ")).toEqual({
      numbers: [
        { labNumber: "R26-00001", kind: "roll" },
        { labNumber: "R26-00002", kind: "roll" },
        { labNumber: "C26-00003", kind: "coupon" },
        { labNumber: "P26-00004", kind: "specimen" },
      ],
      rejected: [],
    });
  });

  it("sets apart what is not a roll, coupon or specimen number", () => {
    expect(parseLabelNumbers(["S26-00001", "T26-00002", "R26-1", "hello", "C26-00009"])).toEqual({
      numbers: [{ labNumber: "C26-00009", kind: "coupon" }],
      rejected: ["S26-00001", "T26-00002", "R26-1", "hello"],
    });
    expect(parseLabelNumbers("")).toEqual({ numbers: [], rejected: [] });
  });
});

describe("label stock", () => {
  it("fills an A4 sheet exactly (63.5 x 38.1 mm labels, 3 x 7; stock dimensions, common practice)", () => {
    const s = LABEL_STOCK;
    expect(s.columns * s.labelWidthMm + (s.columns - 1) * s.columnGapMm + 2 * s.marginLeftMm).toBeCloseTo(s.pageWidthMm, 6);
    expect(s.rows * s.labelHeightMm + 2 * s.marginTopMm).toBeCloseTo(s.pageHeightMm, 6);
    expect(LABELS_PER_SHEET).toBe(21);
  });

  it("splits labels into sheets in order", () => {
    const items = Array.from({ length: 45 }, (_, i) => i);
    expect(splitIntoSheets(items).map((sheet) => sheet.length)).toEqual([21, 21, 3]);
    expect(splitIntoSheets(items).flat()).toEqual(items);
    expect(splitIntoSheets([])).toEqual([]);
    expect(() => splitIntoSheets(items, 0)).toThrow(RangeError);
  });
});

describe("createFifoLimiter", () => {
  it("runs at most `concurrency` tasks at once and starts the rest in arrival order", async () => {
    const limiter = createFifoLimiter(2);
    const started: number[] = [];
    let running = 0;
    let peak = 0;
    const releases: Array<() => void> = [];
    const tasks = Array.from({ length: 5 }, (_, i) =>
      limiter.run(async () => {
        started.push(i);
        running += 1;
        peak = Math.max(peak, running);
        await new Promise<void>((resolve) => releases.push(resolve));
        running -= 1;
        return i;
      }),
    );
    const tick = () => new Promise((resolve) => setTimeout(resolve, 0));
    await tick();
    expect(started).toEqual([0, 1]);
    expect(limiter.stats()).toEqual({ active: 2, waiting: 3 });
    releases[1]!();
    await tick();
    expect(started).toEqual([0, 1, 2]);
    while (releases.length < 5) {
      releases.forEach((release) => release());
      await tick();
    }
    releases.forEach((release) => release());
    expect(await Promise.all(tasks)).toEqual([0, 1, 2, 3, 4]);
    expect(peak).toBe(2);
    expect(limiter.stats()).toEqual({ active: 0, waiting: 0 });
  });

  it("frees the slot when a task fails", async () => {
    const limiter = createFifoLimiter(1);
    await expect(limiter.run(async () => Promise.reject(new Error("boom")))).rejects.toThrow("boom");
    expect(await limiter.run(async () => "next")).toBe("next");
    expect(() => createFifoLimiter(0)).toThrow(RangeError);
  });
});
