"use client";

import { useEffect, useId, useRef, useState } from "react";
import styles from "./lists.module.css";

export type Choice = { id: string; label: string };

type Props = {
  id: string;
  label: string;
  kind: "clients" | "projects";
  /** The choice the list is filtered by now, or null for all. */
  value: Choice | null;
  /** Projects of this client only. */
  clientOrganizationId?: string;
  allLabel: string;
  /** Called with each choice; a GET form (with `name`) needs none. */
  onChange?: (choice: Choice | null) => void;
  /** For a plain GET form: the field's name, sent as a hidden input holding the chosen id. */
  name?: string;
};

/**
 * A client or project field that searches on the server as the person types (GET /api/filter-choices), so a
 * list page carries only the chosen one, never the lab's whole list. Arrow keys move through the matches,
 * Enter takes one, Escape closes them; clearing the text goes back to all. `value` is read once: give the
 * field a `key` of the value's id where the page changes it without a new render of the form.
 */
export function SearchableChoice({ id, label, kind, value, clientOrganizationId, allLabel, onChange, name }: Props) {
  const [chosen, setChosen] = useState(value);
  const [text, setText] = useState(value?.label ?? "");
  const [open, setOpen] = useState(false);
  const [matches, setMatches] = useState<Choice[]>([]);
  const [active, setActive] = useState(0);
  const [message, setMessage] = useState<string | null>(null);
  const listId = useId();
  const asked = useRef(0);


  useEffect(() => {
    if (!open) return;
    const ask = ++asked.current;
    const timer = setTimeout(async () => {
      const params = new URLSearchParams({ kind, q: text === chosen?.label ? "" : text, ...(clientOrganizationId && { clientOrganizationId }) });
      try {
        const response = await fetch(`/api/filter-choices?${params}`);
        const body = (await response.json()) as Choice[] | { error: { message: string } };
        if (ask !== asked.current) return;
        if (Array.isArray(body)) {
          setMatches(body);
          setMessage(body.length ? null : `No ${kind === "clients" ? "client" : "project"} matches “${text}”.`);
        } else setMessage(body.error.message);
        setActive(0);
      } catch {
        if (ask === asked.current) setMessage("The choices could not be loaded; check the connection.");
      }
    }, 200);
    return () => clearTimeout(timer);
  }, [open, text, kind, clientOrganizationId, chosen?.label]);

  const choose = (choice: Choice | null) => {
    setOpen(false);
    setText(choice?.label ?? "");
    setChosen(choice);
    onChange?.(choice);
  };

  return (
    <div className={`field ${styles.choice}`}>
      <label htmlFor={id}>{label}</label>
      {name && <input type="hidden" name={name} value={chosen?.id ?? ""} />}
      <input
        id={id}
        type="search"
        role="combobox"
        aria-expanded={open}
        aria-controls={listId}
        aria-autocomplete="list"
        aria-activedescendant={open && matches[active] ? `${listId}-${active}` : undefined}
        autoComplete="off"
        placeholder={allLabel}
        value={text}
        onFocus={() => setOpen(true)}
        onBlur={() => setTimeout(() => setOpen(false), 150)}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
          if (e.target.value === "" && chosen) choose(null);
        }}
        onKeyDown={(e) => {
          if (e.key === "ArrowDown") {
            e.preventDefault();
            setOpen(true);
            setActive((a) => Math.min(a + 1, matches.length - 1));
          } else if (e.key === "ArrowUp") {
            e.preventDefault();
            setActive((a) => Math.max(a - 1, 0));
          } else if (e.key === "Enter" && open && matches[active]) {
            e.preventDefault();
            choose(matches[active]!);
          } else if (e.key === "Escape") setOpen(false);
        }}
      />
      {open && (
        <ul id={listId} role="listbox" className={styles.choices} aria-label={`${label} matches`}>
          {message && <li className="muted" role="presentation">{message}</li>}
          {matches.map((m, i) => (
            <li key={m.id} id={`${listId}-${i}`} role="option" aria-selected={i === active} onMouseDown={(e) => e.preventDefault()} onClick={() => choose(m)}>
              {m.label}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
