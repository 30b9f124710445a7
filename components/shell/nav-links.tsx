"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "@/lib/policy/navigation";

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  const isCurrent = (href: string) => (href === "/" ? pathname === "/" : pathname === href || pathname.startsWith(`${href}/`));
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
