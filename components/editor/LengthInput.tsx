"use client";
import { useId, useState } from "react";
import type { ParseOptions } from "@/lib/client/engine-port";
import { useEditor } from "@/lib/client/react/EditorContext";
import { useDoc } from "@/lib/client/react/useEditorState";

interface Props extends ParseOptions {
  label: string;
  valueMm: number | null;
  /** Called with a valid length when the field is committed (Enter or leaving it). */
  onCommit(mm: number): void;
  /** Called when the field is emptied and committed, for optional lengths. */
  onClear?(): void;
  placeholder?: string;
  testId?: string;
  className?: string;
}

/**
 * A length typed as measured: fractions, feet and inches or millimetres, read in the plan's units.
 * Shows how the text was read while typing, or what is wrong with it.
 */
export function LengthInput({ label, valueMm, onCommit, onClear, placeholder, testId, className, allowZero, allowNegative }: Props) {
  const ed = useEditor();
  const settings = useDoc((d) => d.settings);
  const id = useId();
  const shown = valueMm == null ? "" : ed.engine.formatLength(valueMm, settings);
  const [text, setText] = useState<string | null>(null);
  const editing = text !== null;
  const read = editing && text.trim() !== "" ? ed.engine.parseLength(text, settings, { allowZero, allowNegative }) : null;
  const invalid = read !== null && !read.ok;

  const commit = () => {
    if (text === null) return;
    if (text.trim() === "" && onClear) onClear();
    else if (read?.ok && (valueMm == null || Math.abs(read.mm - valueMm) > 1e-6)) onCommit(read.mm);
    if (!read || read.ok) setText(null);
  };

  return (
    <div className={className}>
      <label htmlFor={id} className="block text-xs font-medium text-walnut-700">
        {label}
      </label>
      <input
        id={id}
        data-testid={testId}
        className={`mt-0.5 w-full rounded border bg-white px-2 py-1 text-sm tabular-nums focus:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500 ${invalid ? "border-brick-500" : "border-walnut-300"}`}
        value={editing ? text : shown}
        placeholder={placeholder}
        inputMode="text"
        autoComplete="off"
        aria-invalid={invalid}
        aria-describedby={`${id}-read`}
        onChange={(e) => setText(e.target.value)}
        onFocus={(e) => e.currentTarget.select()}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") commit();
          if (e.key === "Escape") setText(null);
        }}
      />
      <p id={`${id}-read`} className={`min-h-4 text-[11px] ${invalid ? "text-brick-700" : "text-walnut-500"}`} aria-live="polite">
        {read ? (read.ok ? `Reads as ${ed.engine.formatLength(read.mm, settings)} (${Math.round(read.mm * 10) / 10} mm)` : read.message) : ""}
      </p>
    </div>
  );
}
