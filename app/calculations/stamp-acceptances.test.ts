import { expect, test } from "vitest";
import { nameAcceptor, stampAcceptances } from "./stamp-acceptances";

const earlier = { by: "Tamsin Quorral", at: new Date(Date.UTC(2024, 2, 4, 9, 30, 0)) };
const now = { by: "Bedric Halvane", at: new Date(Date.UTC(2024, 2, 5, 14, 0, 12, 345)) };
const bridge = "Existing bridge abutment fixes the curve.";

test("a new acceptance gets the saver's name and the save time in ISO 8601 UTC", () => {
  const out = stampAcceptances([{ id: "min-radius:pi-1", reason: bridge }], [], now);
  // ISO 8601 extended format in UTC with a Z designator: ECMA-262, "Date Time String Format" (toISOString).
  expect(out).toEqual([{ id: "min-radius:pi-1", reason: bridge, acceptedBy: "Bedric Halvane", acceptedAt: "2024-03-05T14:00:12.345Z" }]);
});

test("an acceptance carried over with the same reason keeps its original stamp", () => {
  const previous = [{ id: "min-radius:pi-1", reason: bridge, acceptedBy: earlier.by, acceptedAt: earlier.at.toISOString() }];
  expect(stampAcceptances([{ id: "min-radius:pi-1", reason: bridge }], previous, now)).toEqual(previous);
});

test("a changed reason restamps; other acceptances in the same save keep theirs", () => {
  const previous = [
    { id: "min-radius:pi-1", reason: bridge, acceptedBy: earlier.by, acceptedAt: earlier.at.toISOString() },
    { id: "compound-ratio:pi-2", reason: "Ramp loop.", acceptedBy: earlier.by, acceptedAt: earlier.at.toISOString() },
  ];
  const out = stampAcceptances([{ id: "min-radius:pi-1", reason: "Speed zone posted at 50 km/h." }, { id: "compound-ratio:pi-2", reason: "Ramp loop." }], previous, now);
  expect(out.map((a) => [a.id, a.acceptedBy, a.acceptedAt])).toEqual([
    ["min-radius:pi-1", now.by, now.at.toISOString()],
    ["compound-ratio:pi-2", earlier.by, earlier.at.toISOString()],
  ]);
});

test("stamps sent by the client are ignored, on new and on carried-over acceptances", () => {
  const previous = [{ id: "min-radius:pi-1", reason: bridge, acceptedBy: earlier.by, acceptedAt: earlier.at.toISOString() }];
  const forged = { acceptedBy: "Someone Else", acceptedAt: "1999-01-01T00:00:00.000Z" };
  const out = stampAcceptances([{ id: "min-radius:pi-1", reason: bridge, ...forged }, { id: "min-radius:pi-3", reason: "Tie-in.", ...forged }], previous, now);
  expect(out).toEqual([previous[0], { id: "min-radius:pi-3", reason: "Tie-in.", acceptedBy: now.by, acceptedAt: now.at.toISOString() }]);
});

test("an acceptance withdrawn and given again is new, so it is stamped again", () => {
  const previous = [{ id: "min-radius:pi-1", reason: bridge, acceptedBy: earlier.by, acceptedAt: earlier.at.toISOString() }];
  const withdrawn = stampAcceptances([], previous, now);
  expect(withdrawn).toEqual([]);
  expect(stampAcceptances([{ id: "min-radius:pi-1", reason: bridge }], withdrawn, now)[0]?.acceptedBy).toBe(now.by);
});

test("an unchanged acceptance stored before stamping stays unstamped rather than credited to the saver", () => {
  const out = stampAcceptances([{ id: "min-radius:pi-1", reason: bridge }], [{ id: "min-radius:pi-1", reason: bridge }], now);
  expect(out).toEqual([{ id: "min-radius:pi-1", reason: bridge }]);
});

test("a stamp without a name or with an invalid date is refused", () => {
  expect(() => stampAcceptances([], [], { by: " ", at: now.at })).toThrow(/stamp\.by/);
  expect(() => stampAcceptances([], [], { by: "A", at: new Date(Number.NaN) })).toThrow(/stamp\.at/);
});

test("the acceptor is named by the user's name, or their e-mail when the name is blank", () => {
  expect(nameAcceptor({ name: "Tamsin Quorral", email: "planner@demo.test" })).toBe("Tamsin Quorral");
  expect(nameAcceptor({ name: "  ", email: "planner@demo.test" })).toBe("planner@demo.test");
});
