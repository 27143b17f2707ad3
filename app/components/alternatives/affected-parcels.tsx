import { memo } from "react";
import { Badge } from "~/components/ui/badge";
import { Table } from "~/components/ui/table";
import type { ParcelImpactJson } from "./api-types";
import { formatCost, formatNumber } from "./format";

/** Every parcel the draft touches, largest take first. */
export const AffectedParcels = memo(function AffectedParcels({ parcels, areaUnit }: { parcels: ParcelImpactJson[]; areaUnit: string }) {
  const rows = [...parcels].sort((a, b) => b.takeArea - a.takeArea);
  return (
    <div className="max-h-96 overflow-auto">
      <Table
        rows={rows}
        rowKey={(p) => p.parcelId}
        empty="The corridor touches no parcel."
        columns={[
          { header: "Parcel", cell: (p) => p.parcelId },
          { header: "Owner", cell: (p) => p.owner ?? "—" },
          { header: `Take (${areaUnit})`, cell: (p) => formatNumber(p.takeArea, 1), align: "right" },
          { header: "Fraction", cell: (p) => `${formatNumber(p.takeFraction * 100, 1)} %`, align: "right" },
          { header: "Remainder pieces", cell: (p) => p.remainderPieces, align: "right" },
          { header: "Take", cell: (p) => <Badge tone={p.classification === "full" ? "danger" : "take"}>{p.classification}</Badge> },
          { header: "Buildings hit", cell: (p) => p.buildingsHit, align: "right" },
          { header: "Cost estimate", cell: (p) => formatCost(p.estimatedCost), align: "right" },
        ]}
      />
    </div>
  );
});
