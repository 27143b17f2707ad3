import { memo } from "react";
import { formatDms } from "~/geometry/angles";
import type { CurveSummary, KeyStation } from "~/geometry/alignment-types";
import { formatNumber } from "./format";

function stationText(stations: KeyStation[], label: KeyStation["label"], piIndex: number): string {
  return stations.find((s) => s.label === label && s.piIndex === piIndex)?.stationText ?? "—";
}

/**
 * The computed elements of each curve: stations of PI, PC, PCC and PT (station equations applied),
 * tangents T (PI→PC and PI→PT), arc length L, radius R and deflection Δ — the standard circular-
 * curve elements (Schofield & Breach, Engineering Surveying, 6th ed., §10.1 and §10.3).
 */
export const CurveElements = memo(function CurveElements({ curves, stations, length, unit }: { curves: CurveSummary[]; stations: KeyStation[]; length: number; unit: string }) {
  const ends = { pob: stations.find((s) => s.label === "POB")?.stationText, poe: stations.find((s) => s.label === "POE")?.stationText };
  return (
    <div className="space-y-2">
      <p className="text-sm text-ink-soft">
        Length {formatNumber(length, 3)} {unit} · POB {ends.pob ?? "—"} · POE {ends.poe ?? "—"}
      </p>
      {curves.length === 0 ? (
        <p className="text-sm text-ink-soft">No curves yet: give a PI a curve in the table.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse text-sm" aria-label="Curve elements" data-testid="curve-elements">
            <thead>
              <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
                {["PI", "Curve", "PC", "PCC", "PT", `T back / ahead (${unit})`, `L (${unit})`, `R (${unit})`, "Δ"].map((h) => <th key={h} scope="col" className="px-2 py-2 font-semibold">{h}</th>)}
              </tr>
            </thead>
            <tbody>
              {curves.map((c) => (
                <tr key={c.piIndex} className="border-b border-rule align-top last:border-0">
                  <th scope="row" className="px-2 py-1 text-left font-semibold whitespace-nowrap">PI {c.piIndex}<span className="block text-xs font-normal text-ink-soft">{stationText(stations, "PI", c.piIndex)}</span></th>
                  <td className="px-2 py-1">{c.type}, {c.direction}</td>
                  <td className="px-2 py-1 tabular-nums whitespace-nowrap">{stationText(stations, "PC", c.piIndex)}</td>
                  <td className="px-2 py-1 tabular-nums whitespace-nowrap">{c.type === "compound" ? stationText(stations, "PCC", c.piIndex) : "—"}</td>
                  <td className="px-2 py-1 tabular-nums whitespace-nowrap">{stationText(stations, "PT", c.piIndex)}</td>
                  <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{formatNumber(c.tangentPC, 3)} / {formatNumber(c.tangentPT, 3)}</td>
                  <td className="px-2 py-1 text-right tabular-nums">{formatNumber(c.length, 3)}</td>
                  <td className="px-2 py-1 text-right tabular-nums whitespace-nowrap">{c.type === "compound" ? `${formatNumber(c.radius1, 3)} / ${formatNumber(c.radius2, 3)}` : formatNumber(c.radius, 3)}</td>
                  <td className="px-2 py-1 tabular-nums whitespace-nowrap">
                    {formatDms(Math.abs(c.deltaDeg))}
                    {c.type === "compound" && c.delta1Deg !== undefined && c.delta2Deg !== undefined && (
                      <span className="block text-xs text-ink-soft">Δ1 {formatDms(Math.abs(c.delta1Deg))} + Δ2 {formatDms(Math.abs(c.delta2Deg))}</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
});
