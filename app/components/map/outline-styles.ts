import type { ExpressionSpecification } from "maplibre-gl";

/** Take shading: partial takes light, full takes (uneconomic remnants) dark and outlined. */
export const TAKE_STYLES = {
  partial: { colour: "#e8894f", opacity: 0.55, label: "Partial take" },
  full: { colour: "#7d1c1c", opacity: 0.8, label: "Full take (remnant below threshold)" },
} as const;

export const TAKE_FILL: ExpressionSpecification = ["match", ["get", "classification"], "full", TAKE_STYLES.full.colour, TAKE_STYLES.partial.colour];
export const TAKE_OPACITY: ExpressionSpecification = ["match", ["get", "classification"], "full", TAKE_STYLES.full.opacity, TAKE_STYLES.partial.opacity];
