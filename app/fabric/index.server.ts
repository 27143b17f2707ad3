/**
 * Everything the upload route and tile route need from the fabric library.
 * Server-only because it includes the GeoPackage reader (better-sqlite3);
 * browser code imports the plain modules (e.g. crs/epsg-list) directly.
 */
export { FabricInputError, isFabricInputError, type FabricErrorCode } from "./errors";
export type { AreaFeature, AreaGeometry, Properties, ReadOptions, ReadResult, RejectedRow, RepairedRow } from "./types";
export { readParcelUpload } from "./upload/read-parcel-upload.server";
export type { ParcelOverlap, ParcelUpload, ParcelUploadInput, UploadedFeature } from "./upload/upload-types";
export { progressFraction, stageLabel, UPLOAD_STAGES, type ProgressSink, type UploadProgress, type UploadStage } from "./upload/progress";
export { detectFormat, type FabricFormat } from "./upload/detect-format";
export { readShapefileZip } from "./readers/shapefile-zip";
export { readGeoJson } from "./readers/geojson";
export { readGeoPackage } from "./readers/geopackage.server";
export { CRS_ENTRIES, findCrsByCode, parseEpsgCode, searchCrs } from "./crs/epsg-list";
export type { CrsEntry } from "./crs/crs-entry";
export { isProjected, resolveCrs, type ResolvedCrs } from "./crs/resolve-crs";
export { pointConverter, reproject, reprojectPoint } from "./crs/reproject";
export { utmZoneFor } from "./crs/utm-zone";
export { METRES_PER_UNIT, convertArea, convertLength, type LengthUnit } from "./crs/units";
export { polygonArea, ringArea } from "./geometry/area";
export { FEATURE_ID_SOURCE, TARGET_ATTRIBUTES, guessFieldMapping, type FieldMapping, type TargetAttribute } from "./attributes/field-mapping";
export { applyFieldMapping, mapFeatureAttributes, settleFieldMapping, type LandValueBasis, type MappedAttributes } from "./attributes/apply-mapping";
export { encodeTileFeatures, isTileInPyramid, sliceTile, tileBoundsWgs84, TILE_EXTENT, type TileFeature } from "./tiles/vector-tiles";
export { countInTile, indexOverview, overviewTile, worldXY, type OverviewIndex, type OverviewItem, type OverviewOptions, type OverviewProperties, type OverviewTile } from "./tiles/overview";
export { TileCache, type CachedTile } from "./tiles/tile-cache";
