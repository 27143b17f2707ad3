import { expect, test } from "vitest";
import { commitEdit, createHistory, redoEdit, undoEdit } from "./edit-history";

test("undo walks back through committed steps and redo walks forward again", () => {
  let h = createHistory("a");
  h = commitEdit(h, "b");
  h = commitEdit(h, "c");
  h = undoEdit(h);
  expect(h.present).toBe("b");
  h = undoEdit(h);
  expect(h.present).toBe("a");
  expect(undoEdit(h)).toBe(h);
  h = redoEdit(redoEdit(h));
  expect(h.present).toBe("c");
  expect(redoEdit(h)).toBe(h);
});

test("a new edit after an undo drops the steps that could have been redone", () => {
  let h = commitEdit(commitEdit(createHistory(1), 2), 3);
  h = commitEdit(undoEdit(h), 4);
  expect(h).toEqual({ past: [1, 2], present: 4, future: [] });
});

test("the oldest steps go once the limit is reached, and re-committing the present adds nothing", () => {
  let h = createHistory(0);
  for (let i = 1; i <= 5; i++) h = commitEdit(h, i, 3);
  expect(h.past).toEqual([2, 3, 4]);
  expect(commitEdit(h, h.present)).toBe(h);
});
