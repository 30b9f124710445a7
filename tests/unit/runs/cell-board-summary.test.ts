import { describe, expect, it } from "vitest";
import { cellBoardHeadline, summariseCellBoard } from "@/lib/runs/cell-board-summary";

const cell = (run: boolean, usable: boolean) => ({ run: run ? { labNumber: "R-1" } : null, calibration: { usable } });

describe("the cell board's head line", () => {
  it("counts an empty cell whose calibration is overdue as not usable, not as free", () => {
    const summary = summariseCellBoard([cell(true, true), cell(false, true), cell(false, true), cell(false, true), cell(false, true), cell(false, false)]);
    expect(summary).toEqual({ total: 6, free: 4, notUsable: 1 });
    expect(cellBoardHeadline(summary)).toBe("6 cells · 4 free · 1 not usable");
  });

  it("does not count a busy cell as not usable, and says nothing of unusable cells when there are none", () => {
    const summary = summariseCellBoard([cell(true, false), cell(false, true)]);
    expect(summary).toEqual({ total: 2, free: 1, notUsable: 0 });
    expect(cellBoardHeadline(summary)).toBe("2 cells · 1 free");
  });
});
