import { ExchangeInputError } from "./exchange-errors";

/** One CSV record: its fields and the 1-based line of the file it starts on. */
export interface CsvRecord {
  line: number;
  fields: string[];
}

/**
 * Splits CSV text into records by RFC 4180 §2: fields separated by `delimiter`, records by CRLF
 * (LF alone is accepted too), fields in double quotes may hold delimiters, line breaks and `""`
 * for a quote. A quote inside an unquoted field, or an unterminated quoted field, is refused as
 * `malformed_csv` with its line. Blank lines are dropped; a leading UTF-8 byte-order mark is ignored.
 */
export function parseCsvRecords(text: string, delimiter = ","): CsvRecord[] {
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = "";
  let line = 1;
  let recordLine = 1;
  let quoted = false;
  let wasQuoted = false;
  const endField = () => {
    fields.push(field);
    field = "";
    wasQuoted = false;
  };
  const endRecord = () => {
    endField();
    if (fields.length > 1 || fields[0]!.trim() !== "") records.push({ line: recordLine, fields });
    fields = [];
  };
  for (let i = text.charCodeAt(0) === 0xfeff ? 1 : 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (c === '"') quoted = false;
      else {
        if (c === "\n") line++;
        field += c;
      }
    } else if (c === '"') {
      if (field.trim() !== "" || wasQuoted) throw new ExchangeInputError("malformed_csv", `Line ${line}: a quote inside an unquoted field.`, { rows: [{ row: line, message: "a quote inside an unquoted field" }] });
      field = "";
      quoted = wasQuoted = true;
    } else if (c === delimiter) endField();
    else if (c === "\n" || c === "\r") {
      if (c === "\r" && text[i + 1] === "\n") i++;
      endRecord();
      line++;
      recordLine = line;
    } else field += c;
  }
  if (quoted) throw new ExchangeInputError("malformed_csv", `Line ${recordLine}: a quoted field is never closed.`, { rows: [{ row: recordLine, message: "unterminated quoted field" }] });
  if (field !== "" || fields.length) endRecord();
  return records;
}

/** Guesses the delimiter from the header line: ";" or a tab when the line has those and no comma. */
export function guessDelimiter(text: string): string {
  const header = text.slice(0, text.search(/\r?\n|$/));
  if (header.includes(",")) return ",";
  if (header.includes(";")) return ";";
  return header.includes("\t") ? "\t" : ",";
}
