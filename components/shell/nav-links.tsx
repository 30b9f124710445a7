"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "@/lib/policy/navigation";

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  const isCurrent = (href: string) => (href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(`${href}/`));
  let section: string | null = null;
  return (
    <nav className="nav" aria-label="Main">
      {items.map((item) => {
        const heading = item.section !== section ? ((section = item.section), <div className="nav-section" key={`s-${item.section}`}>{item.section}</div>) : null;
        return (
          <span key={item.href} style={{ display: "contents" }}>
            {heading}
            <Link href={item.href} aria-current={isCurrent(item.href) ? "page" : undefined}>
              {item.label}
            </Link>
          </span>
        );
      })}
    </nav>
  );
}
