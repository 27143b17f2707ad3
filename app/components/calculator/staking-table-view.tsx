import { formatDms } from "~/geometry/angles";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { StakingRow } from "~/geometry/staking-table";
import type { LengthUnit } from "~/geometry/units";
import { Table } from "~/components/ui/table";

/** Deflection angles and chords from the PC, one row per stake. */
export function StakingTableView({ rows, units }: { rows: StakingRow[]; units: LengthUnit }) {
  const style = stationStyleForUnits(units);
  const places = units === "m" ? 3 : 2;
  return (
    <Table
      rows={rows}
      rowKey={(r) => `${r.label}-${r.station}`}
      columns={[
        { header: "Point", cell: (r) => (r.label === "station" ? "" : r.label) },
        { header: "Station", cell: (r) => formatStation(r.station, style), className: "font-mono" },
        { header: "Arc from PC", cell: (r) => r.arcFromPc.toFixed(places), align: "right" },
        { header: "Deflection", cell: (r) => formatDms(r.deflectionDeg, { secondsDecimals: 1 }), align: "right" },
        { header: "Chord from PC", cell: (r) => r.chordFromPc.toFixed(places), align: "right" },
        { header: "Chord from previous", cell: (r) => r.subChord.toFixed(places), align: "right" },
      ]}
    />
  );
}
