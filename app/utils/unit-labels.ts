export const UNIT_LABELS = { m: "metres", ft: "international feet", usft: "US survey feet" } as const;
