export { Explorer, type StoredAnalysis } from "./Explorer";
