"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "@/lib/policy/navigation";

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  // Only the longest matching address is current, so /portal/certificates does not also light up /portal.
  const matches = (href: string) => (href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(`${href}/`));
  const current = items.filter((item) => matches(item.href)).sort((a, b) => b.href.length - a.href.length)[0]?.href;
  const isCurrent = (href: string) => href === current;
  return (
    <nav className="nav" aria-label="Main">
      {items.map((item, index) => (
        <span key={item.href} style={{ display: "contents" }}>
          {item.section !== items[index - 1]?.section && <div className="nav-section">{item.section}</div>}
          <Link href={item.href} aria-current={isCurrent(item.href) ? "page" : undefined}>
            {item.label}
          </Link>
        </span>
      ))}
    </nav>
  );
}
