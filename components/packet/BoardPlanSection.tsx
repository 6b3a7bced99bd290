import { G, Rect, Svg, Text as SvgText, Text, View } from "@react-pdf/renderer";
import { formatters } from "@/components/parts/format";
import { nominalWidthName } from "@/lib/engine/boards/stock";
import { PAPER_PT } from "@/lib/server/packet/paper";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, MARGIN_PT, PACKET_FONT, s } from "./styles";

/** The board plan: each board to scale with its pieces in cutting order (labelled) and what is left over. */
export function BoardPlanSection({ data }: { data: PacketData }) {
  const { groups, unplaced } = data.boards;
  if (!groups.length && !unplaced.length) return null;
  const fmt = formatters(data.meta);
  const widthPt = PAPER_PT[data.meta.paper].width - 2 * MARGIN_PT;
  return (
    <PacketPage meta={data.meta} section="Board plan">
      <Text style={s.h2}>Board plan</Text>
      {groups.map((g) => {
        const longest = Math.max(...g.boards.map((b) => b.lengthMm));
        const nominal = nominalWidthName(g.stockWidthMm, g.thicknessMm) ?? fmt.len(g.stockWidthMm);
        return (
          <View key={`${g.materialId}-${g.thicknessMm}-${g.stockWidthMm}`} style={{ marginBottom: 8 }}>
            <Text style={s.h3}>
              {g.materialName}, {nominal} ({fmt.len(g.stockWidthMm)} wide, {fmt.len(g.thicknessMm)} thick)
            </Text>
            <Text style={s.small}>
              {g.boards.length} boards, {fmt.len(g.totalLengthMm)} in all · fewest possible {g.lowerBound} · yield {g.yieldPct.toFixed(0)}%
            </Text>
            {g.boards.map((b) => (
              <View key={b.index} wrap={false} style={{ marginTop: 3 }}>
                <Text style={{ fontSize: 8 }}>
                  Board {b.index}: {fmt.len(b.lengthMm)}
                  {b.leftoverMm > 0 ? ` · left over ${fmt.len(b.leftoverMm)}` : ""} · cuts: {b.cuts.map((c) => `${data.partLabels[c.partId] ?? "?"} ${c.name} ${fmt.len(c.lengthMm)}`).join(", ")}
                </Text>
                <Svg width={widthPt} height={widthPt * (120 / longest)} viewBox={`0 0 ${longest} 120`}>
                  <Rect x={0} y={10} width={b.lengthMm} height={100} fill="#d8cdb8" stroke={INK.text} strokeWidth={3} />
                  {b.cuts.map((c) => (
                    <G key={c.pieceKey}>
                      <Rect x={c.offsetMm} y={10} width={c.lengthMm} height={100} fill="#fdf0cf" stroke="#4b3423" strokeWidth={3} />
                      {c.lengthMm > 150 && (
                        <SvgText x={c.offsetMm + c.lengthMm / 2} y={60} textAnchor="middle" dominantBaseline="central" style={{ fontFamily: PACKET_FONT, fontSize: 48, fontWeight: 600, fill: INK.text }}>
                          {data.partLabels[c.partId] ?? ""}
                        </SvgText>
                      )}
                    </G>
                  ))}
                </Svg>
              </View>
            ))}
          </View>
        );
      })}
      {unplaced.map((u) => (
        <Text key={u.partId} style={{ color: INK.conflict }}>
          Not placed: {u.name} x{u.qty}: {u.reason}
        </Text>
      ))}
    </PacketPage>
  );
}
