/**
 * A standalone SVG picture of the cycle map (see cycleMap), drawn from the
 * same data as the explorer's card: loops under the family nodes, share
 * labels on a white halo. Pure: a string, no DOM.
 */
import type { CycleMap } from "./cycleMap";
import { escapeXml } from "./escapeXml";
import { NETWORK_FONT } from "./networkStyle";

export interface CycleMapSvgOptions {
  /** a title written in the top-left corner */
  title?: string;
  /** id of a cycle drawn in full while the others are faint */
  selected?: string | null;
}

const esc = escapeXml;

export function cycleMapSvg(map: CycleMap, options: CycleMapSvgOptions = {}): string {
  const top = options.title ? 26 : 0;
  const H = map.height + top + (map.other.count ? 18 : 0);
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${map.width}" height="${H}" viewBox="0 0 ${map.width} ${H}" font-family="${esc(NETWORK_FONT)}">`,
    `<rect width="100%" height="100%" fill="#ffffff"/>`,
  ];
  if (options.title)
    out.push(`<text x="10" y="18" font-size="13" font-weight="600" fill="#1f2328">${esc(options.title)}</text>`);
  out.push(`<g transform="translate(0 ${top})">`);
  for (const l of map.loops) {
    const faint = options.selected && options.selected !== l.cycleId ? ' opacity="0.25"' : "";
    out.push(
      `<path class="loop"${faint} d="${l.path}" fill="none" stroke="${l.color}" stroke-width="${l.width}" stroke-linejoin="round" stroke-linecap="round"><title>${esc(`${l.netEquation} (${l.family}): ${l.label.text}`)}</title></path>`,
    );
  }
  for (const n of map.nodes)
    out.push(
      `<g class="family"><circle cx="${n.x}" cy="${n.y}" r="${n.r}" fill="${n.fill}" stroke="${n.stroke}" stroke-width="1.5"/>` +
        `<text x="${n.x}" y="${n.y + 4.5}" text-anchor="middle" font-size="13" font-weight="600" fill="${n.stroke}">${esc(n.label)}</text></g>`,
    );
  for (const l of map.loops)
    out.push(
      `<text x="${l.label.x}" y="${l.label.y + 4}" text-anchor="middle" font-size="11" font-weight="600" fill="#1f2328" stroke="#ffffff" stroke-width="3" paint-order="stroke">${esc(l.label.text)}</text>`,
    );
  out.push("</g>");
  if (map.other.count)
    out.push(
      `<text x="10" y="${H - 6}" font-size="11" fill="#4b5058">${map.other.count} smaller cycle${map.other.count === 1 ? "" : "s"} not drawn: ${esc((map.other.share * 100).toFixed(1))} % of the loss</text>`,
    );
  out.push("</svg>");
  return out.join("\n");
}
