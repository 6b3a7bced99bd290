import { Text, View } from "@react-pdf/renderer";
import type { PacketCheck, PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { INK, s } from "./styles";

const word = { conflict: "Conflict", caution: "Caution", advice: "Advice" } as const;
const colour = { conflict: INK.conflict, caution: INK.caution, advice: INK.soft } as const;

function CheckBlock({ check }: { check: PacketCheck }) {
  const state = check.open.length ? `${check.open.length + check.moreOpen} open` : check.passes ? `met ${check.passes === 1 ? "once" : `${check.passes} times`}` : "nothing to check in this plan";
  return (
    <View style={s.box} wrap={check.open.length > 6}>
      <View style={{ flexDirection: "row", justifyContent: "space-between" }}>
        <Text style={{ fontWeight: 600, fontSize: 10 }}>{check.title}</Text>
        <Text style={{ color: check.open.length ? colour[check.severity] : INK.pass, fontWeight: 600 }}>{state}</Text>
      </View>
      <Text style={s.small}>Rule: {check.formula}</Text>
      {check.numbers.length > 0 && <Text style={s.small}>Numbers: {check.numbers.map((n) => `${n.label} ${n.value}`).join("; ")}</Text>}
      <Text style={s.small}>Sources: {check.sources.map((x) => `${x.citation}${x.status === "practice" ? " (common practice)" : ""}`).join("; ") || "common practice"}</Text>
      {check.open.map((f, i) => (
        <Text key={i} style={{ marginTop: 2 }}>
          <Text style={{ fontWeight: 600, color: colour[f.severity] }}>{word[f.severity]}: </Text>
          {f.message}
          {f.measured && f.required && !f.message.includes(f.measured) ? ` (measured ${f.measured}, needs ${f.required})` : ""}
        </Text>
      ))}
      {check.moreOpen > 0 && <Text style={s.note}>{check.moreOpen} more like these are in the editor&apos;s list.</Text>}
    </View>
  );
}

/** Every check the plan was run against: what is open, with its numbers, and where the numbers come from. */
export function ChecksSection({ data }: { data: PacketData }) {
  const order = [...data.checks].sort((a, b) => Number(b.open.length > 0) - Number(a.open.length > 0));
  return (
    <PacketPage meta={data.meta} section="Checks">
      <Text style={s.h2}>Checks</Text>
      {data.problem ? <Text style={{ color: INK.conflict }}>{data.problem}</Text> : order.map((c) => <CheckBlock key={c.ruleId} check={c} />)}
      <Text style={s.note}>The checks are a planning aid. Local codes, licensed trades and the tool makers&apos; manuals come first.</Text>
    </PacketPage>
  );
}
