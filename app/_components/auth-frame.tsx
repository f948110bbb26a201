import { Wordmark } from "./wordmark";

/** The frame of the pages a visitor sees before signing in. */
export function AuthFrame({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col bg-frame">
      <div className="px-6 py-5 text-xl text-frame-ink">
        <Wordmark />
      </div>
      <main className="flex flex-1 items-start justify-center px-4 pb-16 pt-6">
        <div className="w-full max-w-md rounded-lg bg-paper p-6 shadow-lg">
          <h1 className="mb-4 text-2xl font-bold">{title}</h1>
          {children}
        </div>
      </main>
    </div>
  );
}
