/** A compact list of a record's facts: label and value pairs. */
export function RecordFacts({ facts }: { facts: Array<[label: string, value: React.ReactNode]> }) {
  return (
    <dl className="facts">
      {facts.map(([label, value]) => (
        <div key={label}>
          <dt>{label}</dt>
          <dd>{value ?? "—"}</dd>
        </div>
      ))}
    </dl>
  );
}
