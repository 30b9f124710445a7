/** The standing caution beside rated pressures (shared/DOMAIN.md: cautions the software must carry). */
export function PressureCaution() {
  return (
    <p className="notice notice-caution" role="note">
      Rated pressures protect people: never exceed them. This register does not replace the lab's own inspection and safety procedures.
    </p>
  );
}
