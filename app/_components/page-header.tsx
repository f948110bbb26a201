/** A page's title, with its actions (links styled as buttons) on the right. */
import Link from "next/link";

export function PageHeader({ title, children }: { title: string; children?: React.ReactNode }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <h1 className="text-2xl font-bold">{title}</h1>
      {children && <div className="flex gap-2">{children}</div>}
    </div>
  );
}

export function ActionLink({
  href,
  secondary = false,
  children,
}: {
  href: string;
  secondary?: boolean;
  children: React.ReactNode;
}) {
  return (
    <Link
      href={href}
      className={
        secondary
          ? "rounded border border-accent bg-white px-4 py-2 font-bold text-accent"
          : "rounded bg-accent px-4 py-2 font-bold text-white"
      }
    >
      {children}
    </Link>
  );
}
