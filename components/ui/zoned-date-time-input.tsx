"use client";

import type { InputHTMLAttributes } from "react";
import { Controller, type Control, type FieldValues, type Path } from "react-hook-form";
import { fromWallTime, toWallTime } from "@/lib/format/time-zone";

type Props<T extends FieldValues> = {
  control: Control<T>;
  name: Path<T>;
  /** The lab's time zone: the input shows and takes wall-clock time there, whatever the browser's zone. */
  zone: string;
  /** Show and take seconds (readings). */
  seconds?: boolean;
} & Omit<InputHTMLAttributes<HTMLInputElement>, "type" | "value" | "onChange" | "name" | "defaultValue">;

/** The wall-clock text a datetime-local input shows for a form value (ISO text or a Date); "" when none. */
function wallText(value: unknown, zone: string, seconds?: boolean): string {
  const instant = value instanceof Date ? value : typeof value === "string" && value ? new Date(value) : null;
  return instant && !Number.isNaN(instant.getTime()) ? toWallTime(instant, zone, { seconds }) : "";
}

/**
 * A date-and-time input in the lab's time zone. The form holds the instant as ISO text (UTC), which the
 * shared zod schemas read as a date; the person sees and types the lab's wall-clock time. An incomplete
 * entry holds "", which the schema refuses with its own message.
 */
export function ZonedDateTimeInput<T extends FieldValues>({ control, name, zone, seconds, ...rest }: Props<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <input
          {...rest}
          type="datetime-local"
          step={seconds ? 1 : undefined}
          name={field.name}
          ref={field.ref}
          value={wallText(field.value, zone, seconds)}
          onBlur={field.onBlur}
          onChange={(e) => field.onChange(fromWallTime(e.target.value, zone)?.toISOString() ?? "")}
        />
      )}
    />
  );
}
