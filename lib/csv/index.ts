export { readCsv } from "./readCsv";
export { csvCell, csvRow, csvTable } from "./writeCsv";
