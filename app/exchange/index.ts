/** Public API of alignment exchange: LandXML 1.2 and PI lists in CSV. Pure TypeScript; see README.md. */
export { ExchangeInputError, type ExchangeErrorCode, type RowError } from "./exchange-errors";
export { LANDXML_NAMESPACE, writeLandXmlAlignment, type LandXmlAlignmentExport } from "./landxml-write";
export { readLandXmlAlignments, type LandXmlAlignmentRead } from "./landxml-read";
export { PI_CSV_HEADER, readPiCsv, writePiCsv, type PiCsvOptions } from "./pi-csv";
export { parseCsvRecords, type CsvRecord } from "./csv-records";
export { formatPlainNumber } from "./plain-number";
