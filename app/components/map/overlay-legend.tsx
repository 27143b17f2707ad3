import { TAKE_STYLES } from "./outline-styles";

/** Key to the alternative's overlays: right-of-way, easement, partial and full takes, centreline. */
export function OverlayLegend({ colour }: { colour: string }) {
  const swatch = "inline-block h-3 w-4 rounded-sm border";
  return (
    <div className="absolute bottom-8 left-3 z-10 rounded-md bg-sheet/95 p-3 text-xs shadow-sheet" aria-label="Legend">
      <ul className="space-y-0.5">
        <li className="flex items-center gap-2"><span className={swatch} style={{ background: `${colour}40`, borderColor: colour }} />Right-of-way</li>
        <li className="flex items-center gap-2"><span className={`${swatch} border-dashed`} style={{ borderColor: colour }} />Construction easement</li>
        <li className="flex items-center gap-2"><span className={swatch} style={{ background: TAKE_STYLES.partial.colour }} />{TAKE_STYLES.partial.label}</li>
        <li className="flex items-center gap-2"><span className={swatch} style={{ background: TAKE_STYLES.full.colour }} />{TAKE_STYLES.full.label}</li>
        <li className="flex items-center gap-2"><span className="inline-block h-0.5 w-4 bg-ink" />Centreline</li>
      </ul>
    </div>
  );
}
