export { type CsvCommentEntry, csvCommentBlock, withoutCsvComments } from "./csvCommentBlock";
export { readCsv } from "./readCsv";
export { csvCell, csvRow, csvTable } from "./writeCsv";
