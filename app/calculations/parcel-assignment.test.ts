import fc from "fast-check";
import { expect, test } from "vitest";
import { selectByStationRange, splitEvenly, type StationedParcel } from "./parcel-assignment";

const parcel = (parcelId: string, stationFrom: number, stationTo: number): StationedParcel => ({ parcelId, stationFrom, stationTo });

test("seven parcels among three agents: runs of 3, 2 and 2 along the line, in station order", () => {
  // Given out of order on purpose; P-10 and P-9 start at the same station and sort by their end.
  const parcels = [parcel("P-4", 400, 450), parcel("P-1", 0, 80), parcel("P-10", 600, 700), parcel("P-9", 600, 650), parcel("P-2", 70, 150), parcel("P-3", 150, 400), parcel("P-7", 800, 820)];
  expect(splitEvenly(parcels, ["ann", "bo", "cy"])).toEqual([
    { parcelId: "P-1", agent: "ann" },
    { parcelId: "P-2", agent: "ann" },
    { parcelId: "P-3", agent: "ann" },
    { parcelId: "P-4", agent: "bo" },
    { parcelId: "P-9", agent: "bo" },
    { parcelId: "P-10", agent: "cy" },
    { parcelId: "P-7", agent: "cy" },
  ]);
});

test("more agents than parcels: the last agents get none", () => {
  expect(splitEvenly([parcel("A", 0, 1)], ["ann", "bo"])).toEqual([{ parcelId: "A", agent: "ann" }]);
});

test("no agent to split among is refused", () => {
  expect(() => splitEvenly([parcel("A", 0, 1)], [])).toThrow(/at least one agent/);
});

test("any split gives every parcel to exactly one agent, counts within one of each other, runs contiguous in station order", () => {
  fc.assert(
    fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 5000 }), fc.integer({ min: 0, max: 300 })), { maxLength: 60 }), fc.integer({ min: 1, max: 7 }), (spans, k) => {
      const parcels = spans.map(([from, len], i) => parcel(`Q-${i}`, from, from + len));
      const agents = Array.from({ length: k }, (_, i) => `agent-${i}`);
      const out = splitEvenly(parcels, agents);
      expect(out.map((a) => a.parcelId).sort()).toEqual(parcels.map((p) => p.parcelId).sort());
      const counts = agents.map((a) => out.filter((x) => x.agent === a).length);
      expect(Math.max(...counts) - Math.min(...counts)).toBeLessThanOrEqual(1);
      // Agents appear in one run each, in their given order.
      const sequence = out.map((a) => agents.indexOf(a.agent));
      expect([...sequence].sort((x, y) => x - y)).toEqual(sequence);
      // The output follows the stations.
      const from = out.map((a) => parcels.find((p) => p.parcelId === a.parcelId)!.stationFrom);
      expect([...from].sort((x, y) => x - y)).toEqual(from);
    }),
  );
});

test("a station range picks the takes that overlap it, ends included, in either order", () => {
  const parcels = [parcel("A", 0, 100), parcel("B", 100, 250), parcel("C", 260, 300), parcel("D", 310, 400)];
  expect(selectByStationRange(parcels, 100, 260).map((p) => p.parcelId)).toEqual(["A", "B", "C"]);
  expect(selectByStationRange(parcels, 305, 255).map((p) => p.parcelId)).toEqual(["C"]);
  expect(selectByStationRange(parcels, 401, 500)).toEqual([]);
  expect(() => selectByStationRange(parcels, Number.NaN, 5)).toThrow(/finite/);
});
