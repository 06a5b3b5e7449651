export { csvCell, csvRow, csvTable } from "./writeCsv";
