import { useState } from "react";
import { parseStation, stationStyleForUnits } from "~/geometry/stations";
import { Button } from "~/components/ui/button";
import type { Units } from "~/components/parcel-work/figures";

/** Two stations (e.g. "1+200" or 1200) and a button that selects the parcels whose take overlaps them. */
export function StationRangePicker({ units, onPick }: { units: Units; onPick: (from: number, to: number) => void }) {
  const [from, setFrom] = useState("");
  const [to, setTo] = useState("");
  const [error, setError] = useState<string | null>(null);
  const example = units === "m" ? "1+200.000" : "12+00.00";
  const pick = () => {
    try {
      const style = stationStyleForUnits(units);
      onPick(parseStation(from, style, "from"), parseStation(to, style, "to"));
      setError(null);
    } catch (e) {
      setError(e instanceof Error ? e.message : "Enter two stations.");
    }
  };
  const input = "w-32 rounded-control border border-rule-strong bg-sheet px-2 py-1.5 text-sm";
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="text-label font-semibold">From station<input className={`${input} block`} value={from} onChange={(e) => setFrom(e.target.value)} placeholder={example} /></label>
      <label className="text-label font-semibold">to station<input className={`${input} block`} value={to} onChange={(e) => setTo(e.target.value)} placeholder={example} /></label>
      <Button variant="secondary" onClick={pick}>Select by stations</Button>
      {error && <p role="alert" className="w-full text-xs font-semibold text-danger">{error}</p>}
    </div>
  );
}
