/** Public API of the impact-table exports, for routes (server only: XLSX and the zip use Node). See README.md. */
export type { GeoExportOptions, ImpactExportRow, ImpactExportSheet, ImpactRowSource, StreamedImpactSheet } from "./impact-types";
export { IMPACT_COLUMNS, columnLabel, columnName, type ImpactColumn } from "./impact-columns";
export { impactCsvHeader, streamImpactCsv, writeImpactCsv, type ImpactCsvOptions } from "./impact-csv";
export { streamImpactGeoJson, writeImpactGeoJson, type ImpactGeoJsonOptions } from "./impact-geojson";
export { writeImpactShapefileZip, type ImpactShapefileOptions } from "./impact-shapefile.server";
export { streamImpactXlsx, writeImpactXlsx, type ImpactXlsxOptions } from "./impact-xlsx.server";
export { summarizeImpactRows, type ImpactSummary } from "./impact-summary";
export { sanitizeSheetName } from "./xlsx-sheet-names";
