import { createElement, type ReactElement } from "react";
import { renderToBuffer, type DocumentProps } from "@react-pdf/renderer";
import { PacketDocument } from "@/components/packet/PacketDocument";
import { registerPacketFonts } from "./fonts";
import { buildPacketData } from "./packet-data";
import type { PacketData, PacketInput } from "./types";

/** The packet's PDF bytes for its content. */
export async function renderPacketPdf(data: PacketData): Promise<Buffer> {
  registerPacketFonts();
  return renderToBuffer(createElement(PacketDocument, { data }) as unknown as ReactElement<DocumentProps>);
}

/** The build packet of a plan: content from the engine, then the PDF. */
export async function buildPacket(input: PacketInput): Promise<Buffer> {
  return renderPacketPdf(buildPacketData(input));
}
