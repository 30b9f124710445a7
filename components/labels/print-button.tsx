"use client";

/** Opens the browser's print dialog for the page. */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <button type="button" className="button" onClick={() => window.print()}>
      {label}
    </button>
  );
}
