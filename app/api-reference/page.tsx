import type { Metadata } from "next";
import Link from "next/link";
import { Wordmark } from "@/app/_components/wordmark";
import { ApiReference } from "./api-reference";

export const metadata: Metadata = { title: "API reference" };

/** Public, like the description it renders: it names routes and fields, never data. */
export default function ApiReferencePage() {
  return (
    <div className="min-h-screen bg-white">
      <header className="flex items-center gap-4 bg-frame px-4 py-3 text-frame-ink">
        <Link href="/" className="text-lg">
          <Wordmark />
        </Link>
        <span>API reference</span>
        <a href="/api/v1/openapi.json" className="ml-auto text-sm underline">
          openapi.json
        </a>
      </header>
      <ApiReference />
    </div>
  );
}
