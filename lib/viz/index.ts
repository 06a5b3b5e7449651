export { BUDGET_DEFAULTS, type BudgetBar, type BudgetSeries, budgetSeries, niceMax } from "./budgetSeries";
export { CHIP_HEIGHT_PX, chipWidth, frameTitleWidth } from "./chipWidth";
export {
  deltaE,
  hexToOklab,
  inGamut,
  type Oklab,
  type Oklch,
  oklabToHex,
  oklabToLinearRgb,
  oklchToHex,
  oklchToOklab,
} from "./colorSpace";
export { cycleHighlight, type Highlight } from "./cycleHighlight";
export {
  CYCLE_MAP_DEFAULTS,
  CYCLE_MAP_NODE_RADIUS_PX,
  CYCLE_MAP_SIZE,
  type CycleMap,
  type CycleMapLoop,
  type CycleMapNode,
  type CycleMapOptions,
  cycleMap,
  loopFamilies,
  shareLabelBox,
} from "./cycleMap";
export { type CycleMapSvgOptions, cycleMapSvg } from "./cycleMapSvg";
export { DIVERGING_CENTRE, DIVERGING_DESTROYED, DIVERGING_PRODUCED, divergingColor } from "./divergingColor";
export { equationView } from "./equationView";
export { escapeXml } from "./escapeXml";
export {
  EXPLORER_DEFAULTS,
  type ExplorerQuery,
  type ExplorerView,
  explorerQueryString,
  parseExplorerQuery,
} from "./explorerQuery";
export { familyLabel } from "./familyLabel";
export { type FamilyStyle, familyStyle } from "./familyStyle";
export {
  formatDecade,
  formatLifetime,
  formatMixingRatio,
  formatNumber,
  formatPercent,
  superscript,
} from "./formatNumber";
export { graphSvg, SVG_DEFAULTS, type SvgOptions } from "./graphSvg";
export { isolateText } from "./isolateText";
export {
  grown,
  intersects,
  type LabelBox,
  REACTION_HALF_PX,
  REACTION_LABEL_GAP_PX,
  REACTION_LABEL_HEIGHT_PX,
  type Rect,
  reactionLabelWidth,
  rectAround,
  STUB_HEIGHT_PX,
  stubWidth,
} from "./labelBox";
export { LOG_SCALE_DEFAULTS, type LogScale, logScale } from "./logScale";
export {
  ELEMENTS_DEFAULTS,
  type ElementsOptions,
  frameNodeId,
  IDLE_COLOR,
  LARGE_MECHANISM_SPECIES,
  networkElements,
  reactionNodeId,
  speciesNodeId,
  stubNodeId,
} from "./networkElements";
export {
  type FrameLayout,
  LAYOUT_DEFAULTS,
  type LayoutOptions,
  type NetworkLayout,
  netCoefficients,
  networkLayout,
  type StubLayout,
} from "./networkLayout";
export { networkLegend, RATE_UNIT } from "./networkLegend";
export { NETWORK_FONT, networkStyle, type StyleRule } from "./networkStyle";
export {
  DETAIL_DEFAULTS,
  DETAIL_LEVELS,
  type DetailOptions,
  type ReactionDetail,
  reactionDetail,
} from "./reactionDetail";
export { reactionOxValue } from "./reactionOxValue";
export { RECENT_CACHE_DEFAULTS, type RecentCache, recentCache } from "./recentCache";
export { SEQUENTIAL_ANCHORS, sequentialColor } from "./sequentialColor";
export { SIGNED_LOG_SCALE_DEFAULTS, type SignedLogScale, signedLogScale } from "./signedLogScale";
export { type SpeciesBudget, type SpeciesTerm, speciesBudget } from "./speciesBudget";
export { isStubSpecies } from "./stubSpecies";
export type {
  ColorMode,
  EdgeData,
  EquationView,
  FrameNodeData,
  GraphEdge,
  GraphElement,
  GraphNode,
  Legend,
  MechanismReactionView,
  MechanismSpeciesView,
  MechanismSummary,
  MechanismView,
  NodeData,
  Point,
  ReactionNodeData,
  SpeciesNodeData,
  StubNodeData,
  TitleNodeData,
} from "./types";
