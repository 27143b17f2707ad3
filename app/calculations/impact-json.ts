import type { ParcelTake } from "~/geometry/take-types";

/** One parcel's impact as the API and exports show it; `buildingsHit` counts displacements. */
export function toParcelImpactJson(p: ParcelTake) {
  return {
    parcelId: p.parcelId,
    owner: p.owner,
    address: p.address,
    parcelArea: p.parcelArea,
    takeArea: p.takeArea,
    easementArea: p.easementArea,
    remainderArea: p.remainderArea,
    takeFraction: p.takeFraction,
    remainderPieces: p.remainderPieces,
    remainderPieceAreas: p.remainderPieceAreas,
    classification: p.classification,
    buildingsHit: p.buildingsHit.length,
    buildingIds: p.buildingsHit,
    buildingsNear: p.buildingsNear.length,
    estimatedCost: p.cost.total,
    cost: p.cost,
    stationFrom: p.stationFrom,
    stationTo: p.stationTo,
  };
}

export type ParcelImpactJson = ReturnType<typeof toParcelImpactJson>;
