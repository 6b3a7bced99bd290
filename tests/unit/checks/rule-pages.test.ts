import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { RuleDiagram } from "@/components/rules/RuleDiagram";
import { ruleDiagram } from "@/lib/engine/checks/diagrams";
import { RULES } from "@/lib/engine/checks/registry";

describe("rule objects feed the /rules pages", () => {
  it("every rule has an id, a title, what it protects, a formula and at least one named source", () => {
    const ids = new Set<string>();
    for (const r of RULES) {
      expect(r.id).toMatch(/^[a-z0-9-]+$/);
      expect(ids.has(r.id)).toBe(false);
      ids.add(r.id);
      expect(r.title.length).toBeGreaterThan(3);
      expect(r.protects.length).toBeGreaterThan(20);
      expect(r.formula.length).toBeGreaterThan(5);
      expect(r.sources.length).toBeGreaterThan(0);
      for (const s of r.sources) expect(s.citation.length).toBeGreaterThan(3);
    }
    expect(RULES.length).toBe(23);
  });
  it("the panel drawing uses the NEC zone: 30 in wide, 3 ft deep (NEC 110.26(A)(1), (A)(2))", () => {
    const d = ruleDiagram("panel-working-space")!;
    const ws = d.shapes.find((s) => s.label?.startsWith("Panel working space"))!;
    const xs = ws.polygon.map((p) => p.x);
    const ys = ws.polygon.map((p) => p.y);
    expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(762, 6);
    expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(914.4, 6);
  });
  it("every drawing renders to SVG with its caption", () => {
    for (const r of RULES) {
      const d = ruleDiagram(r.id);
      if (!d) continue;
      const html = renderToStaticMarkup(createElement(RuleDiagram, { diagram: d }));
      expect(html).toContain("<svg");
      expect(html).toContain(d.caption.replace(/'/g, "&#x27;"));
      expect(html).not.toContain("NaN");
    }
  });
});
