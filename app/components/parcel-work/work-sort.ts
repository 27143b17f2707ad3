import { ACQUISITION_STATUSES, type AcquisitionStatus } from "~/calculations/acquisition-status";

/** What the work list sorts and searches on. */
export interface SortableWork {
  projectName: string;
  parcelId: string;
  owner: string | null;
  address: string | null;
  takeArea: number;
  estimatedCost: number;
  stationFrom: number;
  status: AcquisitionStatus;
  statusChangedAt: string;
}

export const WORK_SORTS = ["station", "status", "cost", "take", "changed", "parcel"] as const;
export type WorkSort = (typeof WORK_SORTS)[number];

export const WORK_SORT_LABELS: Record<WorkSort, string> = {
  station: "Project and station",
  status: "Status (earliest stage first)",
  cost: "Estimated cost (highest first)",
  take: "Take area (largest first)",
  changed: "Status changed (oldest first)",
  parcel: "Parcel ID",
};

const stage = (s: AcquisitionStatus) => ACQUISITION_STATUSES.indexOf(s);
const byParcel = (a: SortableWork, b: SortableWork) => a.parcelId.localeCompare(b.parcelId, "en", { numeric: true });
const byStation = (a: SortableWork, b: SortableWork) => a.projectName.localeCompare(b.projectName) || a.stationFrom - b.stationFrom || byParcel(a, b);

const COMPARE: Record<WorkSort, (a: SortableWork, b: SortableWork) => number> = {
  station: byStation,
  status: (a, b) => stage(a.status) - stage(b.status) || byStation(a, b),
  cost: (a, b) => b.estimatedCost - a.estimatedCost || byStation(a, b),
  take: (a, b) => b.takeArea - a.takeArea || byStation(a, b),
  changed: (a, b) => a.statusChangedAt.localeCompare(b.statusChangedAt) || byStation(a, b),
  parcel: byParcel,
};

/** The items matching `query` (in parcel ID, owner or address, any case), in the chosen order. */
export function arrangeWork<T extends SortableWork>(items: readonly T[], sort: WorkSort, query = ""): T[] {
  const q = query.trim().toLowerCase();
  const hit = (w: T) => !q || [w.parcelId, w.owner ?? "", w.address ?? ""].some((s) => s.toLowerCase().includes(q));
  return items.filter(hit).sort(COMPARE[sort]);
}
