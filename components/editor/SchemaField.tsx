"use client";
import { Controller, type FieldValues, type UseFormReturn } from "react-hook-form";
import type { FieldSpec } from "@/lib/client/forms/schema-fields";
import { useDoc } from "@/lib/client/react/useEditorState";
import { LengthInput } from "./LengthInput";

export interface FormApi {
  form: UseFormReturn<FieldValues>;
  commit(): void;
  idPrefix: string;
}

const inputCls = "mt-0.5 w-full rounded border border-walnut-300 bg-white px-2 py-1 text-sm focus:outline-none focus-visible:ring-2 focus-visible:ring-amberline-500";
const labelCls = "block text-xs font-medium text-walnut-700";

function ErrorText({ api, path }: { api: FormApi; path: string }) {
  const err = path.split(".").reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], api.form.formState.errors) as { message?: string } | undefined;
  return err?.message ? <p className="text-[11px] text-brick-700">{err.message}</p> : null;
}

/** One generated field; groups and lists recurse. */
export function SchemaField({ spec, api, base = "" }: { spec: FieldSpec; api: FormApi; base?: string }) {
  const path = base ? `${base}.${spec.path}` : spec.path;
  const id = `${api.idPrefix}-${path}`;
  const materials = useDoc((d) => d.materials);
  switch (spec.kind) {
    case "length":
      return (
        <Controller
          control={api.form.control}
          name={path}
          render={({ field }) => (
            <LengthInput
              label={spec.label}
              valueMm={typeof field.value === "number" ? field.value : null}
              allowZero={spec.allowZero}
              testId={`param-${path}`}
              placeholder={spec.emptyMeans}
              onCommit={(mm) => {
                field.onChange(mm);
                api.commit();
              }}
              onClear={
                spec.emptyMeans
                  ? () => {
                      field.onChange(undefined);
                      api.commit();
                    }
                  : undefined
              }
            />
          )}
        />
      );
    case "number":
      return (
        <div>
          <label htmlFor={id} className={labelCls}>
            {spec.label}
          </label>
          <input id={id} type="number" step={spec.int ? 1 : "any"} min={spec.min} max={spec.max} className={inputCls} {...api.form.register(path, { valueAsNumber: true, onBlur: api.commit })} />
          <ErrorText api={api} path={path} />
        </div>
      );
    case "choice": {
      const numeric = spec.options.every((o) => typeof o.value === "number");
      return (
        <div>
          <label htmlFor={id} className={labelCls}>
            {spec.label}
          </label>
          <select id={id} className={inputCls} {...api.form.register(path, { setValueAs: (v) => (numeric ? Number(v) : v), onChange: api.commit })}>
            {spec.options.map((o) => (
              <option key={String(o.value)} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </div>
      );
    }
    case "toggle":
      return (
        <label className="flex items-center gap-2 text-sm text-walnut-900">
          <input type="checkbox" className="h-4 w-4 accent-walnut-700" {...api.form.register(path, { onChange: api.commit })} />
          {spec.label}
        </label>
      );
    case "material":
      return (
        <div>
          <label htmlFor={id} className={labelCls}>
            {spec.label}
          </label>
          <select id={id} className={inputCls} {...api.form.register(path, { onChange: api.commit })}>
            {[...materials.map((m) => ({ id: m.id, name: m.name })), ...(materials.some((m) => m.id === api.form.getValues(path)) ? [] : [{ id: String(api.form.getValues(path) ?? ""), name: String(api.form.getValues(path) ?? "") }])].map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </div>
      );
    case "text":
      return (
        <div>
          <label htmlFor={id} className={labelCls}>
            {spec.label}
          </label>
          <input id={id} className={inputCls} {...api.form.register(path, { onBlur: api.commit })} />
        </div>
      );
    case "group":
      return (
        <details className="rounded border border-walnut-100 px-2 py-1">
          <summary className="cursor-pointer text-xs font-semibold text-walnut-700">{spec.label}</summary>
          <div className="mt-1 flex flex-col gap-2">
            {spec.fields.map((f) => (
              <SchemaField key={f.path} spec={{ ...f, path: f.path.slice(spec.path.length + 1) }} api={api} base={path} />
            ))}
          </div>
        </details>
      );
    case "list":
      return <ListField spec={spec} api={api} path={path} />;
  }
}

function ListField({ spec, api, path }: { spec: Extract<FieldSpec, { kind: "list" }>; api: FormApi; path: string }) {
  const items = (api.form.watch(path) as unknown[] | undefined) ?? [];
  const set = (next: unknown[]) => {
    api.form.setValue(path, next);
    api.commit();
  };
  return (
    <fieldset className="rounded border border-walnut-100 px-2 py-1">
      <legend className="px-1 text-xs font-semibold text-walnut-700">
        {spec.label} ({items.length})
      </legend>
      {items.map((_, i) => (
        <details key={i} className="mb-1">
          <summary className="cursor-pointer text-xs text-walnut-700">
            {spec.label.replace(/s$/, "")} {i + 1}
          </summary>
          <div className="mt-1 flex flex-col gap-2 pl-2">
            {spec.item.map((f) => (
              <SchemaField key={f.path} spec={f} api={api} base={`${path}.${i}`} />
            ))}
            <button type="button" className="self-start text-xs text-brick-700 underline disabled:opacity-40" disabled={items.length <= spec.min} onClick={() => set(items.filter((__, j) => j !== i))}>
              Remove {spec.label.replace(/s$/, "").toLowerCase()} {i + 1}
            </button>
          </div>
        </details>
      ))}
      <button type="button" className="text-xs text-walnut-700 underline disabled:opacity-40" disabled={items.length >= spec.max} onClick={() => set([...items, {}])}>
        Add {spec.label.replace(/s$/, "").toLowerCase()}
      </button>
    </fieldset>
  );
}
