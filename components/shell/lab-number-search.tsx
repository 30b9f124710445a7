/** Type or scan a lab number (a scanner types it and presses Enter) to open that item. */
export function LabNumberSearch({ label = "Open by lab number" }: { label?: string }) {
  return (
    <form action="/search" method="get" role="search" aria-label={label} className="inline-form">
      <input name="q" placeholder="Lab number, e.g. R26-00001" aria-label="Find by lab number" autoComplete="off" className="mono" />
      <button type="submit" className="button button-quiet">Open</button>
    </form>
  );
}
