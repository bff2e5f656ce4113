/**
 * What `npm start` shows a person at the terminal once the service listens: the
 * hydrostatic table of the first demo hull over a working range of drafts, and the URLs
 * of every demo hull's table (CSV for a spreadsheet's web query, with a plain header, and
 * one figure for a cell). Written to stderr, and only when stderr is a terminal (or
 * HALFBREADTH_BANNER=1; server/main.ts), so the JSON request log on stdout stays
 * machine-readable.
 */
import { hydrostaticResult, hydrostaticsText } from '../core/report/formatHydrostatics.js';
import { hydrostaticTable } from '../core/upright/hydrostatics.js';
import { prepareHull } from '../core/hull/preparedHull.js';
import type { HullStore } from './store/hullStore.js';

/** Six drafts from 30 % to 80 % of the hull's depth, rounded to 5 cm: a working range for a first look. */
function workingDrafts(lowestKeel: number, lowestDeck: number): number[] {
  const depth = lowestDeck - lowestKeel;
  const round = (v: number): number => Math.round(v * 20) / 20;
  const drafts = Array.from({ length: 6 }, (_, k) => round(lowestKeel + depth * (0.3 + 0.1 * k)));
  return [...new Set(drafts)].filter((d) => d > lowestKeel && d <= lowestDeck);
}

export function startBanner(store: HullStore, ids: readonly string[], baseUrl: string): string {
  const lines: string[] = [
    `Halfbreadth is serving on ${baseUrl}  (API: ${baseUrl}/docs)`,
    `Open ${baseUrl}/ in a browser to see a hull's lines, hydrostatics and curves.`,
    '',
  ];
  let shown = false;
  for (const id of ids) {
    const hull = store.get(id);
    if (hull === undefined) continue;
    const prepared = prepareHull(hull.model);
    const drafts = workingDrafts(prepared.lowestKeel, prepared.lowestDeck);
    if (drafts.length === 0) continue;
    const query = `drafts=${drafts[0]}:0.05:${drafts[drafts.length - 1]}`;
    if (!shown) {
      lines.push(hydrostaticsText(hydrostaticResult(hull.model, 1.025, hydrostaticTable(prepared, drafts))));
      shown = true;
    }
    const mid = drafts[Math.floor(drafts.length / 2)]!;
    lines.push(
      `${hull.name}`,
      `  table (JSON):  ${baseUrl}/v1/hulls/${id}/hydrostatics?${query}`,
      `  table (CSV):   ${baseUrl}/v1/hulls/${id}/hydrostatics?${query}&format=csv`,
      `  web query:     ${baseUrl}/v1/hulls/${id}/hydrostatics?${query}&fields=draft,displacement,kmt,tpc&format=csv&header=plain`,
      `  one figure:    ${baseUrl}/v1/hulls/${id}/hydrostatics/displacement?draft=${mid}`,
      `  sheet:         ${baseUrl}/v1/hulls/${id}/sheet?draft=${mid}`,
      `  Bonjean:       ${baseUrl}/v1/hulls/${id}/bonjean`,
      `  areas:         ${baseUrl}/v1/hulls/${id}/areas?draft=${mid}`,
      `  check:         ${baseUrl}/v1/hulls/${id}/check`,
      '',
    );
  }
  lines.push('Stop with Ctrl-C.', '');
  return lines.join('\n');
}
