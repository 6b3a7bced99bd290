import { Text } from "@react-pdf/renderer";
import { money } from "@/components/parts/format";
import type { ShoppingLine } from "@/lib/engine/shopping/types";
import type { PacketData } from "@/lib/server/packet/types";
import { PacketPage } from "./PacketPage";
import { Table, type Column } from "./Table";
import { s } from "./styles";

const qty = (n: number) => String(Math.round(n * 100) / 100);

const COLUMNS: Column<ShoppingLine>[] = [
  { title: "Item", flex: 3.2, cell: (l) => `${l.name}${l.examplePrice ? " *" : ""}` },
  { title: "Need", flex: 1.3, cell: (l) => `${qty(l.needQty)} ${l.needUnit}`, align: "right" },
  { title: "Buy", flex: 1.3, cell: (l) => `${l.buyQty} ${l.buyUnit}`, align: "right" },
  { title: "Each", flex: 1, cell: (l) => money(l.unitPriceCents), align: "right" },
  { title: "Total", flex: 1, cell: (l) => money(l.totalCents), align: "right" },
  { title: "Note", flex: 2.2, cell: (l) => l.note ?? "" },
];

/** The shopping list with its totals (sheets and boards from the nest and board plan, so the counts match the maps). */
export function ShoppingSection({ data }: { data: PacketData }) {
  const list = data.shopping;
  return (
    <PacketPage meta={data.meta} section="Shopping list">
      <Text style={s.h2}>Shopping list</Text>
      <Table columns={COLUMNS} rows={list.lines} />
      <Table
        columns={[
          { title: "Totals", flex: 4, cell: (t: { label: string; cents: number }) => t.label },
          { title: "", flex: 1, cell: (t) => money(t.cents), align: "right" },
        ]}
        rows={[...list.totals.map((t) => ({ label: t.label, cents: t.totalCents })), { label: "All", cents: list.totalCents }]}
        bold={(t) => t.label === "All"}
      />
      {list.usesExamplePrices && <Text style={s.note}>* Example price: set your own prices in the app for a true total.</Text>}
      {list.missingPrices.length > 0 && <Text style={s.note}>No price for: {list.missingPrices.join(", ")} (left out of the totals).</Text>}
      <Text style={s.note}>Waste allowance {list.wasteAllowancePct}% on banding, laminate, finish, track and glue; sheets and boards are counted from the maps.</Text>
    </PacketPage>
  );
}
