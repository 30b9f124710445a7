import Link from "next/link";
import styles from "./lists.module.css";

const TABS = [
  { key: "rolls", label: "Rolls", href: "/samples" },
  { key: "coupons", label: "Coupons", href: "/samples/coupons" },
  { key: "specimens", label: "Specimens", href: "/samples/specimens" },
  { key: "locations", label: "Storage locations", href: "/samples/locations" },
  { key: "retention", label: "Retention", href: "/samples/retention" },
] as const;

/** Rolls | Coupons | Specimens | Storage locations | Retention above the sample pages, so each is a link away. */
export function SampleTabs({ current }: { current: (typeof TABS)[number]["key"] }) {
  return (
    <nav className={styles.tabs} aria-label="Sample pages">
      {TABS.map((tab) => (
        <Link key={tab.key} href={tab.href} aria-current={tab.key === current ? "page" : undefined}>
          {tab.label}
        </Link>
      ))}
    </nav>
  );
}
