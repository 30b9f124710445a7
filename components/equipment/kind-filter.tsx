import Link from "next/link";
import { EQUIPMENT_KIND_LABELS } from "@/lib/format/states";
import { EQUIPMENT_KINDS, type EquipmentKind } from "@/lib/validation/equipment";
import styles from "./equipment.module.css";

/** Plain links that narrow the register to one kind of equipment. */
export function KindFilter({ active }: { active: EquipmentKind | null }) {
  return (
    <nav className={styles.filter} aria-label="Filter by kind">
      <Link href="/equipment" aria-current={active === null ? "page" : undefined}>All</Link>
      {EQUIPMENT_KINDS.map((kind) => (
        <Link key={kind} href={`/equipment?kind=${kind}`} aria-current={active === kind ? "page" : undefined}>{EQUIPMENT_KIND_LABELS[kind]}</Link>
      ))}
    </nav>
  );
}
