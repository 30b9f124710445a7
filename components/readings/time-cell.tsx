"use client";

import { useState } from "react";
import { fromWallTime, toWallTime } from "@/lib/format/time-zone";
import { formatTypedTime, readTypedTime } from "@/lib/format/typed-time";
import styles from "./readings.module.css";

/** Text the schema refuses ("Enter the time … as a real date and time"), keeping what was typed to show it again. */
const UNREAD = "?";

const instantOf = (value: string): Date | null => (/^\d{4}-\d{2}-\d{2}T.*Z$/.test(value) ? new Date(value) : null);

/** What the cell shows for a form value: the instant as the lab's clock reads it, or the text that could not be read. */
export function timeCellText(value: string, zone: string): string {
  const instant = instantOf(value);
  return instant ? formatTypedTime(instant, zone) : value.startsWith(UNREAD) ? value.slice(UNREAD.length) : value;
}

type Props = {
  /** The form's value: an instant as ISO text (UTC), "" or unreadable text marked as such. */
  value: string;
  onChange: (value: string) => void;
  onBlur: () => void;
  inputRef: React.Ref<HTMLInputElement>;
  zone: string;
  /** The reading above (the grid's row above, or the last saved reading): "14:30" means the next 14:30 after it. */
  after: Date | null;
  label: string;
} & Omit<React.InputHTMLAttributes<HTMLInputElement>, "value" | "onChange" | "onBlur" | "type">;

/**
 * The grid's time cell: typed as text in the lab's time zone ("14:30" or "2026-11-30 14:30"), read as it is
 * typed, with the browser's date-and-time picker beside it for the mouse (out of the tab order, so Tab and
 * Enter go from cell to cell).
 */
export function TimeCell({ value, onChange, onBlur, inputRef, zone, after, label, ...rest }: Props) {
  const [typing, setTyping] = useState<string | null>(null);
  const instant = instantOf(value);
  return (
    <span className={styles.timeCell}>
      <input
        {...rest}
        ref={inputRef}
        type="text"
        aria-label={label}
        spellCheck={false}
        value={typing ?? timeCellText(value, zone)}
        onFocus={() => setTyping(timeCellText(value, zone))}
        onChange={(e) => {
          const text = e.target.value;
          setTyping(text);
          const read = readTypedTime(text, zone, { after, day: instant ?? new Date() });
          onChange(read ? read.toISOString() : text.trim() ? `${UNREAD}${text}` : "");
        }}
        onBlur={() => {
          setTyping(null);
          onBlur();
        }}
      />
      <input
        type="datetime-local"
        tabIndex={-1}
        className={styles.picker}
        aria-label={`${label}, picker`}
        value={instant ? toWallTime(instant, zone) : ""}
        onChange={(e) => onChange(fromWallTime(e.target.value, zone)?.toISOString() ?? "")}
      />
    </span>
  );
}
