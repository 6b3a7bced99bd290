import type { ReactNode } from "react";
import { Page, Text, View } from "@react-pdf/renderer";
import type { PacketData } from "@/lib/server/packet/types";
import { s } from "./styles";

interface Props {
  meta: PacketData["meta"];
  /** The section's name, in the running header. */
  section: string;
  children: ReactNode;
  /** Landscape pages for wide drawings. */
  landscape?: boolean;
}

/** One section of the packet on as many pages as it needs, each with the plan name, the revision and page x of y. */
export function PacketPage({ meta, section, children, landscape = false }: Props) {
  return (
    <Page size={meta.paper} orientation={landscape ? "landscape" : "portrait"} style={s.page} wrap>
      <View style={s.header} fixed>
        <Text>{meta.name}</Text>
        <Text>{section}</Text>
      </View>
      {children}
      <View style={s.footer} fixed>
        <Text>
          Revision {meta.revision} · {meta.changed}
        </Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
    </Page>
  );
}
