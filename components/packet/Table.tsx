import { Text, View } from "@react-pdf/renderer";
import { s } from "./styles";

export interface Column<T> {
  title: string;
  /** Share of the row's width. */
  flex: number;
  cell: (row: T) => string;
  align?: "left" | "right";
}

/** A plain table that breaks between rows across pages. */
export function Table<T>({ columns, rows, bold }: { columns: Column<T>[]; rows: T[]; bold?: (row: T) => boolean }) {
  return (
    <View>
      <View style={s.headRow}>
        {columns.map((c) => (
          <Text key={c.title} style={[s.cell, { flex: c.flex, textAlign: c.align ?? "left" }]}>
            {c.title}
          </Text>
        ))}
      </View>
      {rows.map((r, i) => (
        <View key={i} style={[s.row, bold?.(r) ? { fontWeight: 600 } : {}]} wrap={false}>
          {columns.map((c) => (
            <Text key={c.title} style={[s.cell, { flex: c.flex, textAlign: c.align ?? "left" }]}>
              {c.cell(r)}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}
