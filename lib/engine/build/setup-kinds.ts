import type { SetupKind, Station } from "./types";

const MANUAL = "Follow the saw maker's manual for guarding and setup; these notes do not replace it.";
const DUST = "Run dust collection and wear a dust mask: wood dust has an exposure limit of 1 mg/m3 (NIOSH REL; ACGIH TLV inhalable).";
const EARS_EYES = "Wear eye and hearing protection.";

/** Tools and cautions for each station (common practice; cautions defer to the tool maker's manual). */
export const STATION_INFO: Record<Station, { name: string; tools: string[]; cautions: string[] }> = {
  "table-saw-fence": {
    name: "Table saw, rip fence",
    tools: ["table saw", "rip fence", "riving knife", "push sticks", "featherboard", "outfeed support"],
    cautions: [
      "Keep the blade guard and riving knife on for every through rip.",
      "Use a push stick whenever the fence is closer than about 6 in to the blade (common practice).",
      "Stand to the side of the blade's line, out of the path of a kickback.",
      "Support sheet goods on the outfeed side; with a helper, outfeed support reaches about 4 ft past the blade.",
      DUST,
      EARS_EYES,
      MANUAL,
    ],
  },
  "table-saw-sled": {
    name: "Table saw, crosscut sled",
    tools: ["table saw", "crosscut sled with a stop block", "hold-down clamp"],
    cautions: ["Never use the rip fence as a length stop for a crosscut: the offcut can bind and kick back.", "Keep hands clear of the blade's exit path through the sled's back fence.", DUST, EARS_EYES, MANUAL],
  },
  "miter-saw-stop-track": {
    name: "Miter saw, stop track",
    tools: ["miter saw", "stop track with a stop block", "stick-on tape", "clamp or hold-down"],
    cautions: [
      "Keep the upper hood and the self-retracting lower guard working (WAC 296-806-48028).",
      "Let the blade stop before lifting the head or reaching for the offcut.",
      "Support long stock level with the saw table on both sides.",
      DUST,
      EARS_EYES,
      MANUAL,
    ],
  },
  "miter-saw": {
    name: "Miter saw, measured mark",
    tools: ["miter saw", "tape measure", "square", "clamp or hold-down"],
    cautions: ["Keep the upper hood and the self-retracting lower guard working (WAC 296-806-48028).", "Let the blade stop before lifting the head.", DUST, EARS_EYES, MANUAL],
  },
  "panel-cut": {
    name: "Circular saw and straightedge",
    tools: ["circular saw", "straightedge or guide rail", "clamps", "sacrificial foam board or sawhorses"],
    cautions: ["Support both sides of the cut so the kerf does not close on the blade.", "Keep the cord clear of the cut line.", DUST, EARS_EYES, "Follow the saw maker's manual; these notes do not replace it."],
  },
  "dado-stack": {
    name: "Table saw, dado stack",
    tools: ["table saw", "dado stack and its throat plate", "sacrificial fence", "featherboard", "push block", "scrap of the mating part"],
    cautions: [
      "A dado stack cannot be used with the riving knife on most saws: keep hands on a push block and use featherboards.",
      "Use the dado throat plate and check the saw's manual for the largest stack it takes.",
      DUST,
      EARS_EYES,
      MANUAL,
    ],
  },
  "pocket-hole-jig": {
    name: "Pocket-hole jig",
    tools: ["pocket-hole jig", "stepped drill bit with stop collar", "drill", "face clamp", "pocket screws"],
    cautions: ["Clamp the piece in the jig; never hold it by hand while drilling.", "Follow the jig maker's manual for bit depth and screw length.", EARS_EYES],
  },
};

/** Where the first test cut goes, by setup kind (TRADE: make a test cut on scrap first and measure it; practice). */
export function testCutFor(kind: SetupKind, firstLabel: string | undefined): string {
  const then = firstLabel ? ` then cut ${firstLabel} first and check it against the cut list` : "";
  switch (kind) {
    case "rip":
      return `Rip a scrap of the same stock and measure it;${then}.`;
    case "crosscut":
      return `Cut a scrap against the stop and measure it;${then}.`;
    case "dado":
    case "rabbet":
    case "groove":
      return `Cut the joint in scrap of the same stock and check the mating part sits flush;${then}.`;
    case "pocket-screw":
      return `Drill and drive one pocket screw in scrap of the same thickness and check the tip stays inside;${then}.`;
  }
}
