import type { AnalysisResult } from "@/lib/engine/checks/analyze";

/** The analyze answer with a word on what was left out to keep it within the size bound. */
export interface BoundedAnalysis extends AnalysisResult {
  /** Present only when something was left out: what, and why. */
  trimmed?: { findings: number; zones: number; note: string };
}

const bytes = (s: string) => Buffer.byteLength(s, "utf8");

/**
 * JSON text of an analysis, at most `maxBytes` long. Findings come most serious first, so the list is
 * cut from its end; when even the findings' first entry does not fit, the zones go too. What was cut
 * is counted in `omittedFindings` and said in `trimmed`, so a client never mistakes a short list for
 * a clean plan.
 */
export function boundedAnalysisJson(result: AnalysisResult, maxBytes: number): string {
  const whole = JSON.stringify(result);
  if (bytes(whole) <= maxBytes) return whole;
  // Room for the note and the counts, whatever they say.
  const reserve = 400;
  const withoutFindings: BoundedAnalysis = { ...result, findings: [] };
  let zones = result.zones;
  let base = bytes(JSON.stringify(withoutFindings));
  if (base + reserve > maxBytes) {
    zones = [];
    base = bytes(JSON.stringify({ ...withoutFindings, zones }));
  }
  let budget = maxBytes - base - reserve;
  let kept = 0;
  for (const f of result.findings) {
    const size = bytes(JSON.stringify(f)) + 1;
    if (size > budget) break;
    budget -= size;
    kept++;
  }
  const cutFindings = result.findings.length - kept;
  const cutZones = result.zones.length - zones.length;
  const out: BoundedAnalysis = {
    ...result,
    findings: result.findings.slice(0, kept),
    omittedFindings: result.omittedFindings + cutFindings,
    zones,
    trimmed: {
      findings: cutFindings,
      zones: cutZones,
      note: `The answer was cut to stay under ${Math.floor(maxBytes / 1000)} kB: ${cutFindings} of the least serious findings${cutZones ? ` and all ${cutZones} keep-clear zones` : ""} are left out. The summary still counts every finding.`,
    },
  };
  return JSON.stringify(out);
}
