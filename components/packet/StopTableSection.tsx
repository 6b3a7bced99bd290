import { Text, View } from "@react-pdf/renderer";
import { formatters } from "@/components/parts/format";
import type { BuildStopRow } from "@/lib/engine/build";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { Table } from "./Table";
import { INK, s } from "./styles";

/** Each stop track's stop table: where to set the stop for every repeat cut, read off the track's tape. */
export function StopTableSection({ data }: { data: PacketData }) {
  const tables = data.build.stopTables;
  if (!tables.length) return null;
  const fmt = formatters(data.meta);
  return (
    <PacketPage meta={data.meta} section="Stop table">
      <Text style={s.h2}>Stop table</Text>
      {tables.map((t) => (
        <View key={t.fixtureId} style={{ marginBottom: 10 }}>
          <Text style={s.h3}>
            Stop track {t.letter}: {t.name} ({t.side} of the blade)
          </Text>
          <Text style={s.small}>
            Tape offset {fmt.len(t.tapeOffsetMm)} · kerf {fmt.len(t.kerfMm)}, falling {t.kerfSide === "away" ? "away from the stop" : "toward the stop"} · reach {fmt.len(t.minCutMm)} to {fmt.len(t.maxCutMm)}
          </Text>
          <Table
            columns={[
              { title: "Cut length", flex: 1.2, cell: (r: BuildStopRow) => fmt.len(r.cutLengthMm) },
              { title: "Set the tape at", flex: 1.2, cell: (r) => fmt.len(r.tapeReadingMm), align: "right" },
              { title: "Stop from blade", flex: 1.2, cell: (r) => fmt.len(r.fromBladeMm), align: "right" },
              { title: "Qty", flex: 0.6, cell: (r) => (r.source === "typed" ? "" : String(r.qty)), align: "right" },
              { title: "Parts", flex: 3, cell: (r) => (r.source === "typed" ? "typed on the track" : r.labels.join(", ")) },
              { title: "Reach", flex: 1, cell: (r) => (r.inReach ? "in reach" : "OUT OF REACH") },
            ]}
            rows={t.rows}
          />
          {t.notes.map((n, i) => (
            <Text key={i} style={{ color: INK.caution, marginTop: 2 }}>
              {n}
            </Text>
          ))}
        </View>
      ))}
      <Text style={s.note}>Make a test cut at each new stop setting and measure it before cutting the run.</Text>
    </PacketPage>
  );
}
