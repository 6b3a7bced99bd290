import path from "node:path";
import { Font } from "@react-pdf/renderer";
import { PACKET_FONT } from "@/components/packet/styles";

let registered = false;

/**
 * Registers the app's font for the packet: Inter, the family the app ships, in its static cuts
 * (public/fonts; the variable cut the pages use cannot be subset into a PDF). Text stays real text.
 */
export function registerPacketFonts(root = process.cwd()): void {
  if (registered) return;
  const file = (name: string) => path.resolve(root, "public/fonts", name);
  Font.register({
    family: PACKET_FONT,
    fonts: [
      { src: file("Inter-Regular.otf"), fontWeight: 400 },
      { src: file("Inter-SemiBold.otf"), fontWeight: 600 },
    ],
  });
  // Words are never broken with hyphens: a part name must read as typed.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
