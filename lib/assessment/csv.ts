/** The assessment files (key, answer template, marks) are read and written with the shared CSV module. */
export { csvTable as writeCsv, readCsv } from "../csv";
