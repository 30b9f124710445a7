/** Says which parts of the address were not understood and left out, instead of failing the page. */
export function IgnoredValues({ ignored }: { ignored: { key: string; message: string }[] }) {
  if (ignored.length === 0) return null;
  return (
    <div className="notice notice-caution" role="status" data-testid="list-ignored">
      Some of the list settings in the address were left out: {ignored.map((i) => `${i.key} (${i.message})`).join("; ")}
    </div>
  );
}
