import type { PlanDocument } from "@/lib/engine/plan/schema";
import { formatLength } from "@/lib/engine/units/format-length";
import type { SharedPart } from "@/lib/server/services/shared-analysis";

/** The parts list as a plain table (sizes in the plan's units). */
export function ReadOnlyParts({ parts, document }: { parts: SharedPart[]; document: PlanDocument }) {
  const fmt = (mm: number) => formatLength(mm, { units: document.settings.units, precision: document.settings.precision });
  if (!parts.length) return <p className="text-sm text-walnut-700">No parts yet: the plan has no fixtures that are built from stock.</p>;
  return (
    <table className="w-full text-left text-sm" data-testid="parts-table">
      <thead>
        <tr className="border-b border-walnut-100 text-walnut-500">
          <th className="py-1">Part</th>
          <th>Qty</th>
          <th>Length</th>
          <th>Width</th>
          <th>Thickness</th>
          <th>Material</th>
        </tr>
      </thead>
      <tbody>
        {parts.map((p, i) => (
          <tr key={i} className="border-b border-walnut-50">
            <td className="py-1">{p.name}</td>
            <td>{p.qty}</td>
            <td>{fmt(p.lengthMm)}</td>
            <td>{fmt(p.widthMm)}</td>
            <td>{fmt(p.thicknessMm)}</td>
            <td>{p.materialId}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
