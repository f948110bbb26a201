import Link from "next/link";

const TABS = [
  { href: "/admin/organisation", label: "Settings" },
  { href: "/admin/tokens", label: "API tokens" },
  { href: "/admin/audit", label: "Audit trail" },
  { href: "/api-reference", label: "API reference" },
];

/** The organisation's administration pages, one link each; the current one marked. */
export function AdminTabs({ current }: { current: string }) {
  return (
    <nav aria-label="Organisation" className="flex flex-wrap gap-2 border-b border-rule pb-2">
      {TABS.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.href === current ? "page" : undefined}
          className={`rounded px-3 py-1.5 text-sm font-bold ${t.href === current ? "bg-accent text-white" : "text-accent hover:bg-white"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
