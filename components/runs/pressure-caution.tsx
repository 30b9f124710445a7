/** The caution shown wherever pressures are set or recorded. */
export function PressureCaution() {
  return (
    <div className="notice notice-caution" role="note" data-testid="pressure-caution">
      <strong>Pressurised equipment.</strong> Cells, lines and burettes under pressure can fail violently. Keep the cell pressure above both
      line pressures by the confining margin, never exceed an instrument&apos;s rated pressure, and follow the laboratory&apos;s own safety
      procedures: Seepline checks the numbers you enter, it does not replace those procedures or the people trained in them.
    </div>
  );
}
