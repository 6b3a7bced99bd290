import { Text, View } from "@react-pdf/renderer";
import { STATION_INFO } from "@/lib/engine/build";
import type { Setup } from "@/lib/engine/build";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, s } from "./styles";

/** One setting; the kerf side, test cut and tools are printed only where they differ from the setting before (a run of rips shares them). */
function SetupBlock({ setup, prev }: { setup: Setup; prev?: Setup }) {
  const station = STATION_INFO[setup.station];
  const same = prev?.station === setup.station;
  const testCut = same && prev?.testCut.replace(/[A-Z]+\d+/g, "") === setup.testCut.replace(/[A-Z]+\d+/g, "") ? null : setup.testCut;
  return (
    <View style={[s.box, { padding: 4, marginBottom: 4 }]} wrap={setup.items.length > 24}>
      <View style={{ flexDirection: "row", justifyContent: "space-between" }}>
        <Text style={{ fontWeight: 600, fontSize: 10, flex: 1 }}>
          {setup.order}. {setup.title}
        </Text>
        <Text style={{ color: INK.soft }}>
          {station.name} · {setup.totalQty} pieces
        </Text>
      </View>
      {setup.kerfSide && !(same && prev?.kerfSide === setup.kerfSide) && <Text style={s.small}>Kerf: {setup.kerfSide}</Text>}
      <Text style={{ marginTop: 2 }}>
        <Text style={{ fontWeight: 600 }}>Cut at this setting: </Text>
        {setup.items.map((i) => `${i.label} x${i.qty}${i.where ? ` (${i.where})` : ""}`).join(", ")}
      </Text>
      {testCut && <Text style={s.small}>Test cut first: {testCut}</Text>}
      {!(same && prev?.tools.join() === setup.tools.join()) && <Text style={s.small}>Tools: {setup.tools.join(", ")}</Text>}
    </View>
  );
}

/** The setup sheets in run order: each machine setting made once, with every piece cut at it; the stations' cautions once each. */
export function SetupsSection({ data }: { data: PacketData }) {
  const { setups } = data.build;
  if (!setups.length) return null;
  const stations = [...new Set(setups.map((x) => x.station))];
  return (
    <PacketPage meta={data.meta} section="Setup sheets">
      <Text style={s.h2}>Setup sheets</Text>
      <Text style={s.p}>Make each setting once, cut every piece listed under it, then move to the next. Labels are the parts list&apos;s.</Text>
      {setups.map((x, i) => (
        <SetupBlock key={x.id} setup={x} prev={setups[i - 1]} />
      ))}
      <Text style={s.h3}>At each station</Text>
      {stations.map((st) => (
        <View key={st} style={{ marginBottom: 4 }} wrap={false}>
          <Text style={{ fontWeight: 600 }}>{STATION_INFO[st].name}</Text>
          {[...new Set([...STATION_INFO[st].cautions, ...setups.filter((x) => x.station === st).flatMap((x) => x.cautions)])].map((c, i) => (
            <Text key={i} style={{ color: INK.caution }}>
              · {c}
            </Text>
          ))}
        </View>
      ))}
    </PacketPage>
  );
}
