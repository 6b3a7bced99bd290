import { Text, View } from "@react-pdf/renderer";
import type { Drawing } from "@/lib/engine/drawings/types";
import { PAPER_PT } from "@/lib/server/packet/paper";
import type { PacketData } from "@/lib/server/packet/types";
import { DrawingPdf } from "./DrawingPdf";
import { PacketPage } from "./PacketPage";
import { MARGIN_PT, s } from "./styles";

/** Marks that every elevation has (the wall's face, the floor line); a wall with only these has nothing on it. */
const BARE = new Set(["wall", "wall-face", "floor"]);

/** Whether an elevation shows something besides the bare wall (a fixture, an opening, an obstacle). */
export function wallHasSomething(d: Drawing): boolean {
  return d.shapes.some((m) => !BARE.has(m.role)) || d.legend.length > 0;
}

/** One landscape page per wall with something on it: the elevation with its dimension chains and fixture labels, and the legend of tagged items. */
export function WallsSection({ data }: { data: PacketData }) {
  const walls = (data.drawings?.elevations ?? []).filter(wallHasSomething);
  const page = PAPER_PT[data.meta.paper];
  // Landscape: the page's height is the drawing's width.
  const maxW = page.height - 2 * MARGIN_PT;
  const maxH = page.width - 2 * MARGIN_PT - 90;
  return (
    <>
      {walls.map((d) => (
        <PacketPage key={d.wallId} meta={data.meta} section={`Wall: ${d.wallName ?? ""}`} landscape>
          <Text style={s.h2}>{d.title}</Text>
          <View style={{ alignItems: "center" }}>
            <DrawingPdf drawing={d} maxWidthPt={maxW} maxHeightPt={maxH} />
          </View>
          {d.legend.length > 0 && (
            <View style={{ marginTop: 6, flexDirection: "row", flexWrap: "wrap" }}>
              {d.legend.map((e) => (
                <Text key={e.tag} style={{ width: "50%", fontSize: 8 }}>
                  <Text style={{ fontWeight: 600 }}>{e.tag}</Text> {e.text}
                </Text>
              ))}
            </View>
          )}
          <Text style={s.note}>Seen standing in the room facing the wall: left and right as you see them. Heights from the floor.</Text>
        </PacketPage>
      ))}
    </>
  );
}
