import Link from "next/link";
import { redirect } from "next/navigation";
import { countJobs } from "@/assessments/jobs/queries";
import { countComponents } from "@/assessments/load-register/queries";
import { listForemanJobs } from "@/assessments/briefing/queries";
import { countAwaitingReview, countRevisionsByStatus } from "@/assessments/revisions/queries";
import { requireActor } from "@/lib/auth/session";
import { can, type Actor } from "@/lib/permissions";

function Card({
  title,
  value,
  href,
  children,
}: {
  title: string;
  value?: number | string;
  href?: string;
  children?: React.ReactNode;
}) {
  const body = (
    <>
      <h2 className="text-sm font-bold uppercase tracking-wide text-muted">{title}</h2>
      {value !== undefined && <p className="mt-1 text-3xl font-bold tabular-nums">{value}</p>}
      {children}
    </>
  );
  return href ? (
    <Link href={href} className="block rounded-lg border border-rule bg-white p-4 hover:border-accent">
      {body}
    </Link>
  ) : (
    <div className="rounded-lg border border-rule bg-white p-4">{body}</div>
  );
}

async function AdviserOverview({ actor }: { actor: Actor }) {
  const [jobCount, register, byStatus] = await Promise.all([
    countJobs(actor),
    countComponents(actor),
    countRevisionsByStatus(actor),
  ]);
  return (
    <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
      <Card title="Jobs" value={jobCount} href="/jobs" />
      <Card title="Load register" value={register.total} href="/load-register">
        {register.estimated > 0 && (
          <p className="mt-1 text-sm font-bold text-band-watch">{register.estimated} with estimated mass</p>
        )}
      </Card>
      <Card title="Drafts" value={byStatus.draft ?? 0} />
      <Card title="Awaiting approval" value={byStatus.submitted ?? 0} />
    </div>
  );
}

export default async function OverviewPage() {
  const actor = await requireActor();
  if (actor.mustEnrolSecondFactor) redirect("/account/security");
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Good to see you, {actor.name.split(" ")[0]}</h1>
      {can(actor, "assessments:read") && <AdviserOverview actor={actor} />}
      {can(actor, "reviews:read") && (
        <Card title="Waiting for your countersignature" value={await countAwaitingReview(actor)} href="/reviews" />
      )}
      {can(actor, "briefings:run") && (
        <Card
          title="Approved assessments ready to brief"
          value={(await listForemanJobs(actor)).reduce((n, j) => n + j.revisions.length, 0)}
          href="/briefings"
        />
      )}
      {can(actor, "users:manage") && (
        <p className="text-sm text-muted">
          As an administrator you also manage{" "}
          <Link href="/admin/users" className="font-bold text-accent underline">
            the people in your organisation
          </Link>
          .
        </p>
      )}
    </div>
  );
}
