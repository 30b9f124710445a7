"use client";

import { useEffect, useRef, useState } from "react";

/** The name of a scroll area: its own label, else its table's label or caption, else the heading of its section. */
function nameOf(el: HTMLElement): string {
  const table = el.querySelector("table");
  const heading = el.closest("section, .card")?.querySelector("h2, h3");
  return table?.getAttribute("aria-label") || table?.querySelector("caption")?.textContent?.trim() || heading?.textContent?.trim() || "Table";
}

/**
 * A box that scrolls sideways when its table is wider than the page (`.table-wrap`). While it does, it is a
 * named region in the tab order, so a keyboard can reach and scroll it (WCAG 2.1.1); while it does not, it
 * adds no tab stop.
 */
export function ScrollArea({ label, className = "table-wrap", children }: { label?: string; className?: string; children: React.ReactNode }) {
  const ref = useRef<HTMLDivElement>(null);
  const [name, setName] = useState<string | null>(null);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const check = () => setName(el.scrollWidth > el.clientWidth + 1 || el.scrollHeight > el.clientHeight + 1 ? (label ?? nameOf(el)) : null);
    check();
    const observer = new ResizeObserver(check);
    observer.observe(el);
    for (const child of el.children) observer.observe(child);
    return () => observer.disconnect();
  }, [label]);
  return (
    <div ref={ref} className={className} {...(name ? { tabIndex: 0, role: "region", "aria-label": name } : {})}>
      {children}
    </div>
  );
}
