import { expect, test } from "vitest";
import { ACQUISITION_STATUSES, checkStatusMove, nextStatuses } from "./acquisition-status";

// Every move from every status, by hand (rules of issue 6 plus ours: acquired is final and needs
// agreement first; escalation interrupts and resumes anywhere short of acquired). "=" no change.
const MOVES = `
from→to          not-started owner-contacted appraisal offer-made agreed acquired escalated
not-started       =  ok ok ok ok no ok
owner-contacted   ok =  ok ok ok no ok
appraisal         ok ok =  ok ok no ok
offer-made        ok ok ok =  ok no ok
agreed            ok ok ok ok =  ok ok
acquired          no no no no no =  no
escalated         ok ok ok ok ok no =
`;

test("every status move is allowed or refused as the table says", () => {
  const [header, ...lines] = MOVES.trim().split("\n").map((l) => l.trim().split(/\s+/));
  const targets = header!.slice(1);
  expect(targets).toEqual([...ACQUISITION_STATUSES]);
  expect(lines.map((l) => l[0])).toEqual([...ACQUISITION_STATUSES]);
  for (const [from, ...cells] of lines) {
    cells.forEach((cell, i) => {
      const move = checkStatusMove(from as never, targets[i] as never);
      const seen = !move.ok ? "no" : move.changed ? "ok" : "=";
      expect(seen, `${from} → ${targets[i]}`).toBe(cell);
    });
  }
});

test("a refused move says why", () => {
  const move = checkStatusMove("offer-made", "acquired");
  expect(move).toMatchObject({ ok: false });
  if (!move.ok) expect(move.message).toMatch(/agreed/);
});

test("the form offers only the allowed moves", () => {
  expect(nextStatuses("acquired")).toEqual([]);
  expect(nextStatuses("agreed")).toContain("acquired");
  expect(nextStatuses("offer-made")).not.toContain("acquired");
});
