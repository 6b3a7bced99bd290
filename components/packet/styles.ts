import { StyleSheet } from "@react-pdf/renderer";

/** The font family the packet registers (lib/server/packet/fonts.ts): the app's own Inter, in static cuts. */
export const PACKET_FONT = "Inter";

/** Ink and paper of the packet: the app's walnut palette, printable in grey. */
export const INK = { text: "#2a1c12", soft: "#6b4e33", rule: "#c9b79c", conflict: "#a3321f", caution: "#8a5a00", pass: "#2f6b45", band: "#f3ecdf" } as const;

/** Page margins, points (0.5 in). */
export const MARGIN_PT = 36;

export const s = StyleSheet.create({
  page: { fontFamily: PACKET_FONT, fontSize: 9, color: INK.text, paddingTop: MARGIN_PT + 14, paddingBottom: MARGIN_PT + 12, paddingHorizontal: MARGIN_PT },
  header: { position: "absolute", top: MARGIN_PT - 14, left: MARGIN_PT, right: MARGIN_PT, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: INK.soft, borderBottomWidth: 0.5, borderBottomColor: INK.rule, paddingBottom: 3 },
  footer: { position: "absolute", bottom: MARGIN_PT - 16, left: MARGIN_PT, right: MARGIN_PT, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: INK.soft, borderTopWidth: 0.5, borderTopColor: INK.rule, paddingTop: 3 },
  h1: { fontSize: 20, fontWeight: 600, marginBottom: 4, lineHeight: 1.15 },
  h2: { fontSize: 14, fontWeight: 600, marginBottom: 6 },
  h3: { fontSize: 10.5, fontWeight: 600, marginTop: 8, marginBottom: 3 },
  p: { marginBottom: 4 },
  small: { fontSize: 7.5, color: INK.soft },
  note: { fontSize: 8, color: INK.soft, marginTop: 4 },
  row: { flexDirection: "row", borderBottomWidth: 0.4, borderBottomColor: INK.rule, paddingVertical: 2 },
  headRow: { flexDirection: "row", borderBottomWidth: 0.8, borderBottomColor: INK.text, paddingVertical: 2, fontWeight: 600 },
  cell: { paddingRight: 4 },
  box: { borderWidth: 0.6, borderColor: INK.rule, borderRadius: 3, padding: 6, marginBottom: 6 },
});
