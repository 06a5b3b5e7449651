/**
 * Types of the view layer: what the explorer reads from the routes and the
 * plain data it hands to the canvas and the charts. Rates in molecules cm⁻³ s⁻¹.
 */
import type { RateLaw, Uncertainty } from "../kinetics/types";
import type { EquationTerm } from "../mechanism/parseEquation";
import type { SpeciesRole } from "../mechanism/types";

/** A species as GET /api/mechanisms/{id} lists it. */
export interface MechanismSpeciesView {
  id: string;
  label: string;
  role: SpeciesRole;
  group?: string;
  atoms: Readonly<Record<string, number>>;
}

/** A reaction as GET /api/mechanisms/{id} lists it. */
export interface MechanismReactionView {
  id: string;
  equation: string;
  rate: RateLaw;
  uncertainty?: Uncertainty;
  source?: string;
  note?: string;
}

/** The body of GET /api/mechanisms/{id}. */
export interface MechanismView {
  id: string;
  title: string;
  description: string;
  builtin: boolean;
  /** the document as written */
  text?: string;
  species: MechanismSpeciesView[];
  reactions: MechanismReactionView[];
  pools: { id: string; label: string; expression: string }[];
  warnings?: unknown[];
}

/** One entry of GET /api/mechanisms. */
export interface MechanismSummary {
  id: string;
  title: string;
  description: string;
  builtin: boolean;
  speciesCount: number;
  reactionCount: number;
}

/** The species terms of an equation as drawn (lib/viz/equationView.ts); M is a flag, not a term. */
export interface EquationView {
  reactants: EquationTerm[];
  products: EquationTerm[];
  photolysis: boolean;
  thirdBody: boolean;
}

/** How edges and reaction nodes are coloured. */
export type ColorMode = "flux" | "ox";

/** A point on the canvas, px. */
export interface Point {
  x: number;
  y: number;
}

/** Node data handed to cytoscape (plain JSON). */
export interface SpeciesNodeData {
  id: string;
  kind: "species";
  speciesId: string;
  label: string;
  family: string;
  /** frame node id this species sits in (not cytoscape's "parent": frames are plain nodes) */
  frame: string;
  role: SpeciesRole;
  /** true for held and third-body species */
  spectator: boolean;
  /** fill colour, hex */
  fill: string;
  /** outline colour, hex */
  stroke: string;
  /** text colour, hex */
  ink: string;
  /** molecules cm⁻³, null when the analysis does not list it */
  numberDensity_cm3: number | null;
  /** chip width from the label length, px */
  width: number;
}

export interface ReactionNodeData {
  id: string;
  kind: "reaction";
  reactionId: string;
  label: string;
  equation: string;
  /** molecules cm⁻³ s⁻¹ */
  rate_cm3s: number;
  /** colour from the active mode, hex */
  color: string;
  /** px */
  size: number;
}

export interface FrameNodeData {
  id: string;
  kind: "frame";
  family: string;
  label: string;
  /** tint, hex */
  fill: string;
  stroke: string;
  /** smallest width that holds the title, px */
  minWidth: number;
  /** the frame's box around its chips (frameBoxes), px; the node's position is its centre */
  width: number;
  height: number;
}

export interface EdgeData {
  id: string;
  kind: "edge";
  source: string;
  target: string;
  reactionId: string;
  speciesId: string;
  /** "in": species consumed by the reaction; "out": produced */
  direction: "in" | "out";
  coef: number;
  /** molecules cm⁻³ s⁻¹ (the reaction's rate) */
  rate_cm3s: number;
  /** hex */
  color: string;
  /** px */
  width: number;
}

/** A bath gas or O2 drawn beside one reaction (see stubSpecies). */
export interface StubNodeData {
  id: string;
  kind: "stub";
  reactionId: string;
  speciesId: string;
  label: string;
  /** label box width, px */
  width: number;
}

/** A family frame's title, drawn as its own node so that it sits above the edges that pass. */
export interface TitleNodeData {
  id: string;
  kind: "title";
  family: string;
  label: string;
  /** text colour, hex */
  ink: string;
}

export type NodeData = SpeciesNodeData | ReactionNodeData | FrameNodeData | StubNodeData | TitleNodeData;

export interface GraphNode {
  group: "nodes";
  data: NodeData;
  /** absent on frame nodes: cytoscape sizes them around their children */
  position?: Point;
  classes: string;
}

export interface GraphEdge {
  group: "edges";
  data: EdgeData;
  classes: string;
}

export type GraphElement = GraphNode | GraphEdge;

/** A colour legend: a ramp with labelled ticks. */
export interface Legend {
  title: string;
  /** unit string shown beside the scale */
  unit: string;
  /** gradient stops left to right, offset 0–1 */
  stops: { offset: number; color: string }[];
  /** tick positions 0–1 along the ramp and their labels */
  ticks: { offset: number; label: string }[];
  /** words under the two ends of the ramp */
  lowLabel: string;
  highLabel: string;
  /** edge widths shown as examples */
  widths: { width: number; label: string }[];
}
