import { Path, Svg, Text, View } from "@react-pdf/renderer";
import type { PacketData } from "@/lib/server/packet/types";
import { PAPER_PT } from "@/lib/server/packet/paper";
import { DrawingPdf } from "./DrawingPdf";
import { PacketPage } from "./PacketPage";
import { INK, MARGIN_PT, s } from "./styles";

const QR_PT = 92;

const sev = { conflict: "Conflict", caution: "Caution", advice: "Advice" } as const;

/** The cover: plan name, owner, date and revision, the plan view with dimensions, what is still open, and the QR code to the shop view. */
export function CoverSection({ data }: { data: PacketData }) {
  const { meta, summary } = data;
  const page = PAPER_PT[meta.paper];
  const width = page.width - 2 * MARGIN_PT;
  return (
    <PacketPage meta={meta} section="Cover">
      <View style={{ flexDirection: "row", justifyContent: "space-between" }}>
        <View style={{ flex: 1, paddingRight: 12 }}>
          <Text style={s.small}>Build packet</Text>
          <Text style={s.h1}>{meta.name}</Text>
          <Text>
            By {meta.ownerName} · revision {meta.revision} · last changed {meta.changed}
          </Text>
          <Text style={s.small}>
            {meta.fixtureCount} fixtures · lengths in {meta.units === "mm" ? "millimetres" : "inches"} · {meta.paper === "A4" ? "A4" : "Letter"} paper
            {meta.presetName ? ` · rule numbers from the preset "${meta.presetName}"` : ""}
            {meta.shared ? " · printed from a read-only share link" : ""}
          </Text>
        </View>
        <View style={{ alignItems: "center", width: QR_PT + 20 }}>
          <Svg width={QR_PT} height={QR_PT} viewBox={`-2 -2 ${data.qr.size + 4} ${data.qr.size + 4}`}>
            <Path d={data.qr.path} fill="#000000" />
          </Svg>
          <Text style={[s.small, { textAlign: "center", marginTop: 2 }]}>Scan for the shop view on a phone</Text>
        </View>
      </View>
      <View style={{ marginTop: 10, alignItems: "center" }}>
        {data.drawings ? <DrawingPdf drawing={data.drawings.plan} maxWidthPt={width} maxHeightPt={page.height * 0.5} /> : <Text style={{ color: INK.conflict }}>{data.problem}</Text>}
      </View>
      <View style={[s.box, { marginTop: 10 }]} wrap={false}>
        <Text style={s.h3}>Still open</Text>
        <Text>
          {summary.conflicts} conflicts · {summary.cautions} cautions · {summary.advice} advice notes · {summary.passes} checks met
        </Text>
        {summary.top.map((f, i) => (
          <Text key={i} style={{ marginTop: 2 }}>
            <Text style={{ fontWeight: 600, color: f.severity === "conflict" ? INK.conflict : INK.caution }}>{sev[f.severity]}: </Text>
            {f.message}
          </Text>
        ))}
        {summary.conflicts + summary.cautions > summary.top.length && <Text style={s.note}>The checks pages list every open finding with its numbers and sources.</Text>}
        <Text style={s.note}>Shop view: {meta.shopUrl}</Text>
      </View>
    </PacketPage>
  );
}
