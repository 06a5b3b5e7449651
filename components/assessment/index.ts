export { AssessmentBuilder } from "./AssessmentBuilder";
export { Field } from "./Field";
export { MarkingPanel } from "./MarkingPanel";
export { PrintButton } from "./PrintButton";
export { StudentSheetView } from "./StudentSheetView";
export type { MechanismOption, Preview, TemplateOption } from "./types";
