import Link from "next/link";
import styles from "./lists.module.css";

const TABS = [
  { key: "rolls", label: "Rolls", href: "/samples" },
  { key: "coupons", label: "Coupons", href: "/samples/coupons" },
  { key: "specimens", label: "Specimens", href: "/samples/specimens" },
] as const;

/** Rolls | Coupons | Specimens above the three sample lists. */
export function SampleTabs({ current }: { current: (typeof TABS)[number]["key"] }) {
  return (
    <nav className={styles.tabs} aria-label="Kinds of sample">
      {TABS.map((tab) => (
        <Link key={tab.key} href={tab.href} aria-current={tab.key === current ? "page" : undefined}>
          {tab.label}
        </Link>
      ))}
    </nav>
  );
}
