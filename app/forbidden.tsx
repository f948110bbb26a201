import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-bold">Not available for your role</h1>
      <p className="mt-3 text-muted">
        Your account does not give access to this page. If you need it, ask your organisation&apos;s administrator.
      </p>
      <Link href="/" className="mt-6 inline-block font-bold text-accent underline">
        Back to the overview
      </Link>
    </main>
  );
}
