"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import { cx } from "@/components/ui/cx";

export interface NavItem {
  href: string;
  label: string;
}

/** A section is current on its own path and anywhere beneath it. */
export function isCurrent(pathname: string, href: string): boolean {
  return pathname === href || pathname.startsWith(`${href}/`);
}

export function ShellNav({ items, className }: { items: NavItem[]; className?: string }) {
  const pathname = usePathname() ?? "";
  return (
    <nav aria-label="Sections" className={className}>
      <ul className="flex items-center gap-1 overflow-x-auto">
        {items.map((item) => {
          const current = isCurrent(pathname, item.href);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={current ? "page" : undefined}
                className={cx(
                  "block rounded-md px-3 py-1.5 text-sm font-medium whitespace-nowrap transition-colors",
                  current ? "bg-paper text-ink shadow-panel" : "text-paper/75 hover:bg-white/8 hover:text-paper",
                )}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
