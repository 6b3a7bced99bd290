"use client";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDerived } from "@/lib/client/react/useEditorState";

const methodText: Record<string, string> = { diagonals: "solved from the diagonals", angles: "solved from the corner angles", "assumed-square": "assumed square (no diagonals)", mixed: "solved from diagonals and angles", lengths: "solved from the wall lengths" };

/** The solved floor's numbers: how far each corner is off square, diagonal difference, closure gap. */
export function SquarenessReport() {
  const ed = useEditor();
  const report = useDerived((s) => s.derived?.room.report ?? null);
  if (!report) return null;
  const letter = (i: number) => String.fromCharCode(65 + i);
  return (
    <section aria-labelledby="square-h" className="rounded border border-walnut-100 bg-white/60 p-2" data-testid="squareness">
      <h2 id="square-h" className="text-sm font-semibold text-walnut-900">
        Solved floor
      </h2>
      <p className="text-xs text-walnut-700">Shape {methodText[report.method] ?? report.method}.</p>
      <table className="mt-1 w-full text-xs tabular-nums">
        <caption className="sr-only">Corner angles</caption>
        <thead>
          <tr className="text-left text-walnut-500">
            <th scope="col">Corner</th>
            <th scope="col">Angle</th>
            <th scope="col">Off square</th>
          </tr>
        </thead>
        <tbody>
          {report.cornerAnglesDeg.map((a, i) => (
            <tr key={i}>
              <th scope="row" className="font-normal">
                {letter(i)}
              </th>
              <td>{a.toFixed(2)}°</td>
              <td className={Math.abs(report.offSquareDeg[i]) > 0.25 ? "font-semibold text-amberline-700" : ""}>{(report.offSquareDeg[i] >= 0 ? "+" : "") + report.offSquareDeg[i].toFixed(2)}°</td>
            </tr>
          ))}
        </tbody>
      </table>
      {report.diagonalDifferenceMm !== null ? <p className="mt-1 text-xs">Diagonals differ by {ed.formatLength(report.diagonalDifferenceMm)}.</p> : null}
      {report.closureErrorMm > 0.5 ? <p className="text-xs text-amberline-700">The walls miss closing by {ed.formatLength(report.closureErrorMm)}: check a measurement.</p> : null}
      {report.notes.map((n) => (
        <p key={n} className="text-xs text-walnut-500">
          {n}
        </p>
      ))}
    </section>
  );
}
