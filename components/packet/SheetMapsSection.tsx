import { G, Line, Polygon, Rect, Svg, Text as SvgText, Circle } from "@react-pdf/renderer";
import { Text, View } from "@react-pdf/renderer";
import { formatters, type Formatters } from "@/components/parts/format";
import { cutMarks, cutSteps } from "@/lib/engine/nesting/cut-marks";
import type { MaterialNest, SheetLayout } from "@/lib/engine/nesting/types";
import { PAPER_PT } from "@/lib/server/packet/paper";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, MARGIN_PT, PACKET_FONT, s } from "./styles";

const CUT_RED = "#b5432c";

/** One sheet to scale: pieces with their labels and sizes, grain arrows, offcuts, trim and the numbered cuts (the same layout as the screen's sheet map). */
function SheetSvg({ sheet, kerfMm, labels, fmt, widthPt }: { sheet: SheetLayout; kerfMm: number; labels: Record<string, string>; fmt: Formatters; widthPt: number }) {
  const L = sheet.lengthMm;
  const W = sheet.widthMm;
  const font = Math.max(22, Math.min(L, W) / 30);
  const heightPt = (widthPt * (W + 8)) / (L + 8);
  const txt = (size: number, fill: string, weight = 400) => ({ fontFamily: PACKET_FONT, fontSize: size, fontWeight: weight, fill });
  return (
    <Svg width={widthPt} height={heightPt} viewBox={`-4 -4 ${L + 8} ${W + 8}`}>
      <Rect x={0} y={0} width={L} height={W} fill="#ece3d0" stroke={INK.text} strokeWidth={4} />
      {(sheet.usable.lenMm < L || sheet.usable.widMm < W) && (
        <Rect x={sheet.usable.xMm} y={sheet.usable.yMm} width={sheet.usable.lenMm} height={sheet.usable.widMm} fill="none" stroke="#7a5a3e" strokeWidth={2} strokeDasharray="12 8" />
      )}
      {sheet.offcuts.map((o, i) => (
        <G key={`o${i}`}>
          <Rect x={o.xMm} y={o.yMm} width={o.lenMm} height={o.widMm} fill={o.reusable ? "#dcebdd" : "#d8cdb8"} stroke={o.reusable ? "#2f7d4f" : "none"} strokeWidth={3} />
          {o.reusable && o.lenMm > 6 * font && o.widMm > 2 * font && (
            <SvgText x={o.xMm + o.lenMm / 2} y={o.yMm + o.widMm / 2} textAnchor="middle" dominantBaseline="central" style={txt(font * 0.8, "#1f5636")}>
              {`offcut ${fmt.size(o.lenMm, o.widMm)}`}
            </SvgText>
          )}
        </G>
      ))}
      {sheet.placements.map((p) => {
        const cx = p.xMm + p.lenMm / 2;
        const cy = p.yMm + p.widMm / 2;
        const label = labels[p.partId] ?? "";
        const size = fmt.size(p.rotated ? p.widMm : p.lenMm, p.rotated ? p.lenMm : p.widMm);
        const named = `${label}  ${p.name}`;
        const tall = p.widMm > 2.4 * font;
        // Text goes in only where it fits the piece (Inter's average letter is about 0.55 of its size).
        const fitsLine = (text: string, k: number) => text.length * 0.56 * font * k < p.lenMm * 0.94;
        const top = tall && fitsLine(named, 1.1) ? named : tall && fitsLine(label, 1.1) ? label : null;
        const big = top !== null && fitsLine(size, 0.85);
        const fits = p.lenMm > 1.6 * font && p.widMm > 1.2 * font;
        const ax = p.xMm + font;
        const ay = p.yMm + p.widMm - font * 0.7;
        const bx = p.xMm + Math.min(p.lenMm - font, 5 * font);
        return (
          <G key={p.pieceKey}>
            <Rect x={p.xMm} y={p.yMm} width={p.lenMm} height={p.widMm} fill="#fdf0cf" stroke="#4b3423" strokeWidth={3} />
            {big ? (
              <>
                <SvgText x={cx} y={cy - font * 0.7} textAnchor="middle" dominantBaseline="central" style={txt(font * 1.1, INK.text, 600)}>
                  {top}
                </SvgText>
                <SvgText x={cx} y={cy + font * 0.6} textAnchor="middle" dominantBaseline="central" style={txt(font * 0.85, "#4b3423")}>
                  {size}
                </SvgText>
              </>
            ) : (
              fits && (
                <SvgText x={cx} y={cy} textAnchor="middle" dominantBaseline="central" style={txt(font * 0.9, INK.text, 600)}>
                  {label}
                </SvgText>
              )
            )}
            {p.grain !== "none" && p.lenMm > 4 * font && p.widMm > 1.5 * font && (
              <G>
                <Line x1={ax} y1={ay} x2={bx - font * 0.4} y2={ay} stroke="#7a5a3e" strokeWidth={3} />
                <Polygon points={`${bx},${ay} ${bx - font * 0.5},${ay - font * 0.25} ${bx - font * 0.5},${ay + font * 0.25}`} fill="#7a5a3e" />
              </G>
            )}
          </G>
        );
      })}
      {cutMarks(sheet, kerfMm, font * 0.75).map((m) => (
        <G key={`c${m.seq}`}>
          <Line x1={m.x1} y1={m.y1} x2={m.x2} y2={m.y2} stroke={CUT_RED} strokeWidth={2} strokeDasharray="16 6" />
          <Circle cx={m.cx} cy={m.cy} r={m.r} fill={CUT_RED} />
          <SvgText x={m.cx} y={m.cy} textAnchor="middle" dominantBaseline="central" style={txt(m.r * 1.07, "#ffffff", 600)}>
            {String(m.seq)}
          </SvgText>
        </G>
      ))}
    </Svg>
  );
}

/**
 * The map's width, points: as wide as the page allows while the cut list (three columns of 7.5 pt
 * lines, at most about 48 letters a line) still fits under it on the same page.
 */
function mapWidth(sh: SheetLayout, steps: string[], maxWidthPt: number, bodyHeightPt: number): number {
  const lines = Math.max(0, ...columns(steps, 3).map((col) => col.reduce((n, t) => n + Math.ceil(t.length / 48), 0)));
  const listPt = lines * 10 + 24;
  const heightPt = Math.max(120, bodyHeightPt - listPt);
  return Math.min(maxWidthPt, (heightPt * (sh.lengthMm + 8)) / (sh.widthMm + 8));
}

/** Lines split into `n` columns, filled top to bottom. */
function columns(lines: string[], n: number): string[][] {
  const per = Math.max(1, Math.ceil(lines.length / n));
  return Array.from({ length: n }, (_, i) => lines.slice(i * per, (i + 1) * per)).filter((c) => c.length > 0);
}

function sheetTitle(m: MaterialNest, sh: SheetLayout, fmt: Formatters): string {
  return `${m.materialName} · ${fmt.len(m.thicknessMm)} thick: sheet ${sh.index} of ${m.sheets.length}${sh.source === "offcut" ? " (your offcut)" : ""} · ${fmt.size(sh.lengthMm, sh.widthMm)} · ${sh.placements.length} pieces · yield ${sh.yieldPct.toFixed(0)}%`;
}

/** One landscape page per sheet: the map, then the cut order in words. */
export function SheetMapsSection({ data }: { data: PacketData }) {
  const fmt = formatters(data.meta);
  const page = PAPER_PT[data.meta.paper];
  const widthPt = page.height - 2 * MARGIN_PT;
  const sheets = data.sheets.flatMap((m) => m.sheets.map((sh) => ({ m, sh })));
  const steps = (sh: SheetLayout) => cutSteps(sh, fmt.len).map((c) => `${c.seq}. ${c.text}`);
  if (!sheets.length) return null;
  return (
    <>
      {sheets.map(({ m, sh }) => (
        <PacketPage key={`${m.materialId}-${m.thicknessMm}-${sh.index}`} meta={data.meta} section="Sheet maps" landscape>
          <Text style={s.h3}>{sheetTitle(m, sh, fmt)}</Text>
          <SheetSvg sheet={sh} kerfMm={data.kerfMm} labels={data.partLabels} fmt={fmt} widthPt={mapWidth(sh, steps(sh), widthPt, page.width - 2 * MARGIN_PT - 60)} />
          <Text style={s.small}>Numbers in the pieces are their labels in the parts list; arrows show the grain; red numbers are the cut order. Kerf {fmt.len(data.kerfMm)}.</Text>
          <View style={{ flexDirection: "row", marginTop: 3 }}>
            {columns(steps(sh), 3).map((col, i) => (
              // One text per column, not one per cut: the PDF's text layout costs per text box.
              <Text key={i} style={{ flex: 1, fontSize: 7.5, paddingRight: 6 }}>
                {col.join("\n")}
              </Text>
            ))}
          </View>
        </PacketPage>
      ))}
    </>
  );
}
