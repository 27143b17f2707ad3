import { expect, test } from "vitest";
import { arrangeWork, type SortableWork } from "./work-sort";

const item = (parcelId: string, over: Partial<SortableWork> = {}): SortableWork => ({
  projectName: "Quillmere Eastern Bypass",
  parcelId,
  owner: null,
  address: null,
  takeArea: 100,
  estimatedCost: 1000,
  stationFrom: 0,
  status: "not-started",
  statusChangedAt: "2026-01-01T00:00:00.000Z",
  ...over,
});

const ITEMS = [
  item("QM-10", { stationFrom: 300, status: "agreed", estimatedCost: 500, owner: "Brannock Farms" }),
  item("QM-2", { stationFrom: 100, status: "escalated", estimatedCost: 9000, address: "2 Weir Road" }),
  item("QM-9", { stationFrom: 200, status: "owner-contacted", takeArea: 900, statusChangedAt: "2025-12-01T00:00:00.000Z" }),
];

const ids = (xs: SortableWork[]) => xs.map((x) => x.parcelId);

test("each sort gives the order a person would expect", () => {
  expect(ids(arrangeWork(ITEMS, "station"))).toEqual(["QM-2", "QM-9", "QM-10"]);
  // Stages in their order; escalated comes after acquired in the list of statuses.
  expect(ids(arrangeWork(ITEMS, "status"))).toEqual(["QM-9", "QM-10", "QM-2"]);
  expect(ids(arrangeWork(ITEMS, "cost"))).toEqual(["QM-2", "QM-9", "QM-10"]);
  expect(ids(arrangeWork(ITEMS, "take"))).toEqual(["QM-9", "QM-2", "QM-10"]);
  expect(ids(arrangeWork(ITEMS, "changed"))).toEqual(["QM-9", "QM-2", "QM-10"]);
  // Numbers inside IDs compare as numbers: QM-2 < QM-9 < QM-10.
  expect(ids(arrangeWork(ITEMS, "parcel"))).toEqual(["QM-2", "QM-9", "QM-10"]);
});

test("the search looks in parcel ID, owner and address, ignoring case", () => {
  expect(ids(arrangeWork(ITEMS, "station", "brannock"))).toEqual(["QM-10"]);
  expect(ids(arrangeWork(ITEMS, "station", "WEIR"))).toEqual(["QM-2"]);
  expect(ids(arrangeWork(ITEMS, "station", "qm-9"))).toEqual(["QM-9"]);
  expect(arrangeWork(ITEMS, "station", "nobody")).toEqual([]);
});

test("arranging does not reorder the caller's array", () => {
  const copy = [...ITEMS];
  arrangeWork(ITEMS, "cost");
  expect(ITEMS).toEqual(copy);
});
