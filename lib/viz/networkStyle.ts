/**
 * The cytoscape stylesheet of the network, as data. The look is this
 * project's own: chamfered chips for species (dashed and hollow when held),
 * small rounded hexagons for reactions, soft family frames with their name
 * on top, chevrons on the edges into products. Colours and widths come from
 * the element data (see networkElements), so switching the colour mode only
 * changes data, never the sheet.
 */

export interface StyleRule {
  selector: string;
  style: Record<string, string | number | number[]>;
}

export const NETWORK_FONT = 'ui-sans-serif, system-ui, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif';

export function networkStyle(): StyleRule[] {
  return [
    {
      // a plain node with its box in the data (frameBoxes), drawn beneath everything else
      selector: "node.frame",
      style: {
        shape: "round-rectangle",
        width: "data(width)",
        height: "data(height)",
        "background-color": "data(fill)",
        "border-width": 1,
        "border-color": "data(stroke)",
        "border-opacity": 0.35,
        "z-compound-depth": "bottom",
        events: "no",
      },
    },
    {
      // the frame's title is a node of its own above the edges, on a soft halo, so that no line runs through it
      selector: "node.title",
      style: {
        shape: "round-rectangle",
        width: 1,
        height: 1,
        "background-opacity": 0,
        "border-width": 0,
        label: "data(label)",
        "text-valign": "center",
        "text-halign": "center",
        "font-family": NETWORK_FONT,
        "font-size": 16,
        "font-weight": 600,
        color: "data(ink)",
        "text-background-color": "#ffffff",
        "text-background-opacity": 0.85,
        "text-background-padding": "2px",
        "text-background-shape": "round-rectangle",
        "z-index": 50,
        events: "no",
      },
    },
    { selector: "node.title.dim", style: { opacity: 0.45 } },
    {
      selector: "node.species",
      style: {
        shape: "cut-rectangle",
        width: "data(width)",
        height: 30,
        "background-color": "data(fill)",
        "border-width": 1.5,
        "border-color": "data(stroke)",
        label: "data(label)",
        "text-valign": "center",
        "text-halign": "center",
        "font-family": NETWORK_FONT,
        "font-size": 15,
        "font-weight": 600,
        color: "data(ink)",
        "z-index": 20,
      },
    },
    {
      selector: "node.species.spectator",
      style: { "border-style": "dashed", "font-weight": 400, color: "#4b5058" },
    },
    {
      // a bath gas or O2 beside one reaction: a quiet tag, no chip
      selector: "node.stub",
      style: {
        shape: "round-rectangle",
        width: "data(width)",
        height: 15,
        "background-color": "#ffffff",
        "background-opacity": 0.9,
        "border-width": 0,
        label: "data(label)",
        "text-valign": "center",
        "text-halign": "center",
        "font-family": NETWORK_FONT,
        "font-size": 11,
        color: "#4b5058",
        "z-index": 18,
        events: "no",
      },
    },
    {
      selector: "edge.stub-edge",
      style: { opacity: 0.7, "arrow-scale": 0.6 },
    },
    {
      selector: "node.reaction",
      style: {
        shape: "round-hexagon",
        width: "data(size)",
        height: "data(size)",
        "background-color": "data(color)",
        "border-width": 1.5,
        "border-color": "#ffffff",
        "z-index": 15,
      },
    },
    {
      selector: "node.reaction.idle",
      style: { "background-color": "#ffffff", "border-color": "#a9a69d", "border-width": 1 },
    },
    {
      selector: "edge.flow",
      style: {
        // straight edges skip the control points a bezier edge needs on every redraw, and match the SVG export
        "curve-style": "straight",
        width: "data(width)",
        "line-color": "data(color)",
        "target-arrow-color": "data(color)",
        "line-cap": "round",
        opacity: 0.92,
        "z-index": 5,
      },
    },
    {
      selector: "edge.out",
      style: { "target-arrow-shape": "chevron", "arrow-scale": 0.9 },
    },
    {
      selector: "edge.idle",
      style: { "line-style": "dashed", "line-dash-pattern": [3, 4], opacity: 0.7 },
    },
    {
      selector: "node.reaction.hl",
      style: {
        label: "data(label)",
        "font-family": NETWORK_FONT,
        "font-size": 12,
        "font-weight": 600,
        color: "#1f2328",
        "text-valign": "bottom",
        "text-margin-y": 3,
        "text-background-color": "#ffffff",
        "text-background-opacity": 0.85,
        "text-background-padding": "1px",
        "border-color": "#1f2328",
        "border-width": 2,
        "z-index": 40,
      },
    },
    { selector: "edge.hl", style: { opacity: 1, "z-index": 30 } },
    { selector: "node.species.hl", style: { "border-width": 2.5, "border-color": "#1f2328" } },
    { selector: "node.dim", style: { opacity: 0.18 } },
    { selector: "edge.dim", style: { opacity: 0.07 } },
    // a frame's opacity would also fade the lit species inside it, so a dimmed frame fades its own paint only
    {
      selector: "node.frame.dim",
      style: { opacity: 1, "background-opacity": 0.35, "border-opacity": 0.12, "text-opacity": 0.45 },
    },
    {
      selector: "node:selected",
      style: { "overlay-color": "#1f2328", "overlay-opacity": 0.14, "overlay-padding": 5 },
    },
  ];
}
