import { Document } from "@react-pdf/renderer";
import type { PacketData } from "@/lib/server/packet/types";
import { BoardPlanSection } from "./BoardPlanSection";
import { BuildOrderSection } from "./BuildOrderSection";
import { CautionsSection } from "./CautionsSection";
import { ChecksSection } from "./ChecksSection";
import { CoverSection } from "./CoverSection";
import { PartsSection } from "./PartsSection";
import { SetupsSection } from "./SetupsSection";
import { SheetMapsSection } from "./SheetMapsSection";
import { ShoppingSection } from "./ShoppingSection";
import { StopTableSection } from "./StopTableSection";
import { WallsSection } from "./WallsSection";

/** The build packet, section by section, in the order a build uses them. */
export function PacketDocument({ data }: { data: PacketData }) {
  return (
    <Document title={`${data.meta.name}: build packet`} author={data.meta.ownerName} subject={`Build packet, revision ${data.meta.revision}`} creator="Benchwright" producer="Benchwright">
      <CoverSection data={data} />
      <WallsSection data={data} />
      <ChecksSection data={data} />
      <PartsSection data={data} />
      <SheetMapsSection data={data} />
      <BoardPlanSection data={data} />
      <SetupsSection data={data} />
      <StopTableSection data={data} />
      <BuildOrderSection data={data} />
      <ShoppingSection data={data} />
      <CautionsSection data={data} />
    </Document>
  );
}
