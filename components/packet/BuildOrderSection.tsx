import { Text, View } from "@react-pdf/renderer";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, s } from "./styles";

/** The build order: steps from levelling the toe kicks to hanging the fronts, each with its parts, setups, waits and cautions. */
export function BuildOrderSection({ data }: { data: PacketData }) {
  const { steps, setups, notes } = data.build;
  if (!steps.length && !notes.length) return null;
  const setupNo = new Map(setups.map((x) => [x.id, x.order]));
  return (
    <PacketPage meta={data.meta} section="Build order">
      <Text style={s.h2}>Build order</Text>
      {notes.map((n, i) => (
        <Text key={`n${i}`} style={{ color: INK.caution, marginBottom: 2 }}>
          {n}
        </Text>
      ))}
      {steps.map((st) => (
        <View key={st.id} style={s.box} wrap={false}>
          <View style={{ flexDirection: "row", alignItems: "center" }}>
            {/* A box to tick at the bench. */}
            <View style={{ width: 8, height: 8, borderWidth: 0.8, borderColor: INK.text, marginRight: 5 }} />
            <Text style={{ fontWeight: 600, fontSize: 10 }}>
              {st.order}. {st.title}
            </Text>
          </View>
          <Text>{st.detail}</Text>
          {st.parts.length > 0 && <Text style={s.small}>Parts: {st.parts.map((p) => `${p.label} x${p.qty}`).join(", ")}</Text>}
          {st.setupIds.length > 0 && <Text style={s.small}>Setups: {st.setupIds.map((id) => setupNo.get(id) ?? id).join(", ")}</Text>}
          {st.timeNotes.map((t, i) => (
            <Text key={`t${i}`} style={s.small}>
              Wait: {t.text} ({t.source})
            </Text>
          ))}
          {st.cautions.map((c, i) => (
            <Text key={`c${i}`} style={{ color: INK.caution, fontSize: 8 }}>
              Caution: {c}
            </Text>
          ))}
        </View>
      ))}
    </PacketPage>
  );
}
