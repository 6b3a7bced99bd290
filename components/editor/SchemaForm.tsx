"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMemo } from "react";
import { useForm, type FieldValues, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { fieldsOf } from "@/lib/client/forms/schema-fields";
import { SchemaField, type FormApi } from "./SchemaField";

interface Props {
  schema: z.ZodType;
  value: Record<string, unknown>;
  /** Called with the parsed value (defaults filled) when a committed change passes the schema. */
  onValid(next: Record<string, unknown>): void;
  /** Paths not to show (ids, kinds, placement: edited elsewhere). */
  hide?: readonly string[];
  idPrefix: string;
}

/**
 * A form generated from a zod object schema: lengths in the plan's units, choices, toggles,
 * groups and lists. Each committed field runs the schema; valid results become one edit.
 */
export function SchemaForm({ schema, value, onValid, hide = [], idPrefix }: Props) {
  const fields = useMemo(() => fieldsOf(schema).filter((f) => !hide.includes(f.path)), [schema, hide]);
  const form = useForm<FieldValues>({ resolver: zodResolver(schema as never) as unknown as Resolver<FieldValues>, values: value, mode: "onChange" });
  const api: FormApi = {
    form,
    idPrefix,
    commit: () => {
      void form.handleSubmit((data) => {
        if (JSON.stringify(data) !== JSON.stringify(value)) onValid(data as Record<string, unknown>);
      })();
    },
  };
  return (
    <form className="flex flex-col gap-2" onSubmit={(e) => e.preventDefault()} noValidate>
      {fields.map((f) => (
        <SchemaField key={f.path} spec={f} api={api} />
      ))}
    </form>
  );
}
