"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export function CommissionTabs({ id }: { id: number }) {
  const path = usePathname();
  const base = `/commissions/${id}`;
  const tabs = [
    { href: base, label: "Overview", match: (p: string) => p === base },
    { href: `${base}/revisions`, label: "Revisions", match: (p: string) => p.startsWith(`${base}/revisions`) },
    { href: `${base}/people`, label: "People", match: (p: string) => p.startsWith(`${base}/people`) },
    { href: `${base}/release`, label: "Release", match: (p: string) => p.startsWith(`${base}/release`) },
    { href: `${base}/trail`, label: "Trail", match: (p: string) => p.startsWith(`${base}/trail`) },
  ];
  return (
    <nav aria-label="Commission" className="-mx-4 overflow-x-auto border-b border-line px-4 sm:mx-0 sm:px-0">
      <ul className="flex gap-1">
        {tabs.map((t) => {
          const active = t.match(path);
          return (
            <li key={t.href}>
              <Link href={t.href} aria-current={active ? "page" : undefined}
                className={`inline-flex min-h-11 items-center border-b-2 px-3 font-medium no-underline ${active ? "border-action text-action" : "border-transparent text-ink-soft hover:text-ink"}`}>
                {t.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
