import { Text, View } from "@react-pdf/renderer";
import { DEFER } from "@/lib/server/packet/cautions";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, s } from "./styles";

/** The cautions for this plan's work, each deferring to local codes and the tool makers' manuals. */
export function CautionsSection({ data }: { data: PacketData }) {
  return (
    <PacketPage meta={data.meta} section="Cautions">
      <Text style={s.h2}>Cautions</Text>
      <Text style={[s.p, { color: INK.caution }]}>This packet is a planning aid, not a licence to skip the rules that apply where you live. {DEFER}</Text>
      {data.cautions.map((c, i) => (
        <View key={i} style={s.box} wrap={false}>
          <Text style={{ fontWeight: 600 }}>{c.title}</Text>
          <Text>{c.text}</Text>
          <Text style={s.small}>
            Source: {c.source}. {DEFER}
          </Text>
        </View>
      ))}
    </PacketPage>
  );
}
