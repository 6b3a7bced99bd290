import { Text } from "@react-pdf/renderer";
import type { PacketData, PacketPartLine } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { Table, type Column } from "./Table";
import { s } from "./styles";

const grain = { length: "along length", width: "along width", none: "none" } as Record<string, string>;

const COLUMNS: Column<PacketPartLine>[] = [
  { title: "Label", flex: 0.6, cell: (p) => p.label },
  { title: "Part", flex: 2.4, cell: (p) => p.name },
  { title: "Qty", flex: 0.6, cell: (p) => (p.pieces !== p.qty ? `${p.qty} (${p.pieces} pieces)` : String(p.qty)), align: "right" },
  { title: "Length x width x thickness", flex: 2.6, cell: (p) => `${p.length} x ${p.width} x ${p.thickness}` },
  { title: "Material, grain", flex: 2, cell: (p) => `${p.material}${p.grain === "none" ? "" : `, grain ${grain[p.grain] ?? p.grain}`}` },
  { title: "Edges and joinery", flex: 3, cell: (p) => p.notes },
  { title: "For", flex: 2, cell: (p) => p.fixtures },
];

/** The merged parts list (identical parts of all fixtures on one line, with the label to pencil on each piece) and the hardware totals. */
export function PartsSection({ data }: { data: PacketData }) {
  return (
    <PacketPage meta={data.meta} section="Parts list" landscape>
      <Text style={s.h2}>Parts list</Text>
      {data.parts.length ? <Table columns={COLUMNS} rows={data.parts} /> : <Text>Add fixtures to the plan to see their parts.</Text>}
      <Text style={s.note}>
        Sizes are finished sizes with the joinery allowances in; length runs with the grain where the part has grain. A label is the letter of the first fixture that uses the part and the part&apos;s number in it:
        pencil it on each piece as it comes off the saw.
      </Text>
      {data.build.fixtures.length > 0 && <Text style={s.small}>Fixtures: {data.build.fixtures.map((f) => `${f.letter} ${f.name}`).join(" · ")}</Text>}
      {data.hardware.length > 0 && (
        <>
          <Text style={s.h3}>Hardware</Text>
          <Table
            columns={[
              { title: "Item", flex: 4, cell: (h: PacketData["hardware"][number]) => h.name },
              { title: "Qty", flex: 1, cell: (h) => h.qty, align: "right" },
            ]}
            rows={data.hardware}
          />
        </>
      )}
    </PacketPage>
  );
}
