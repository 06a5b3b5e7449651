export { ProfileBands } from "./ProfileBands";
export { RangeTable } from "./RangeTable";
export { SensitivityTable } from "./SensitivityTable";
export { ShareRangeBars } from "./ShareRangeBars";
export { UncertaintyPanel } from "./UncertaintyPanel";
