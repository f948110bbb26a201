import Link from "next/link";
import { Wordmark } from "@/app/_components/wordmark";
import { SafetyCaution } from "@/app/_components/safety-caution";
import { requireActor } from "@/lib/auth/session";
import { can } from "@/lib/permissions";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { NAVIGATION } from "./navigation";
import { NavLinks } from "./nav-links";
import { Providers } from "./providers";
import { PhoneSync } from "./briefings/device/phone-sync";
import { ServiceWorker } from "@/app/_components/service-worker";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const actor = await requireActor();
  const items = NAVIGATION.filter((item) => item.action === null || can(actor, item.action)).map(({ href, label }) => ({
    href,
    label,
  }));
  return (
    <ServiceWorker>
      <div className="flex min-h-screen flex-col">
        <header className="bg-frame text-frame-ink">
          <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
            <Link href="/" className="text-lg">
              <Wordmark />
            </Link>
            <div className="order-3 w-full md:order-2 md:w-auto md:flex-1">
              <NavLinks items={items} />
            </div>
            <div className="order-2 ml-auto flex items-center gap-3 text-sm md:order-3">
              <Link href="/account" data-testid="signed-in-as" className="hover:underline" title="Your account">
                {actor.name} · <span className="opacity-80">{ROLE_LABELS[actor.role]}</span>
              </Link>
              <Link href="/sign-out" className="rounded border border-frame-ink/40 px-2 py-1 hover:bg-white/10">
                Sign out
              </Link>
            </div>
          </div>
        </header>
        <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">
          <Providers>{children}</Providers>
          {can(actor, "briefings:run") && <PhoneSync userId={actor.id} />}
        </main>
        <footer className="mx-auto w-full max-w-6xl px-4 pb-6">
          <SafetyCaution />
        </footer>
      </div>
    </ServiceWorker>
  );
}
