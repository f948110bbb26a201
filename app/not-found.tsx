import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-bold">Not found</h1>
      <p className="mt-3 text-muted">There is nothing here, or it is not yours to see.</p>
      <Link href="/" className="mt-6 inline-block font-bold text-accent underline">
        Back to the overview
      </Link>
    </main>
  );
}
