/** What every test section of a certificate opens and closes with, hydraulic or index. */

/** "Test 2 of 5 · D5887" with the lab numbers of what was tested beside it. */
export function TestHead({ number, count, methodCode, children }: { number: number; count: number; methodCode: string; children: React.ReactNode }) {
  return (
    <div className="cert-test-head">
      <h2>Test {number} of {count} · {methodCode}</h2>
      <div className="cert-test-ids">{children}</div>
    </div>
  );
}

/** The method's title and the edition of the standard it was run to (or that none was recorded). */
export function MethodEdition({ method, testId }: { method: { code: string; title: string; edition?: string }; testId: string }) {
  return (
    <>
      <h3 style={{ marginTop: 0 }}>{method.title}</h3>
      <div className="doc-small" data-testid={testId}>{method.edition ? `Standard: ASTM ${method.edition}` : `Standard: ${method.code}, edition not recorded`}</div>
    </>
  );
}

/** The deviations from the method, or "None." */
export function Deviations({ items }: { items: readonly string[] }) {
  return (
    <>
      <h3>Deviations from the method</h3>
      {items.length ? <ul style={{ margin: 0, paddingLeft: "14pt" }}>{items.map((d, i) => <li key={i}>{d}</li>)}</ul> : <p>None.</p>}
    </>
  );
}
