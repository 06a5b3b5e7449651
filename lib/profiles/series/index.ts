export * from "./chartFrame";
export * from "./chartReadout";
export * from "./differenceSeries";
export * from "./familyColor";
export * from "./familySplitSeries";
export * from "./lossProfileSeries";
export * from "./profileBandSeries";
