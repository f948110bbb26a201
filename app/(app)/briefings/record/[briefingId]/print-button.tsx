"use client";

export function PrintButton() {
  return (
    <button type="button" onClick={() => window.print()} className="rounded bg-accent px-4 py-2 font-bold text-white">
      Print
    </button>
  );
}
