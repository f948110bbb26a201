/** Recovery codes, shown once after they are made. */
export function RecoveryCodes({ codes }: { codes: string[] }) {
  return (
    <div className="rounded border-2 border-accent bg-white p-4" role="status">
      <p className="font-bold">Your recovery codes: save them now, they are shown only this once.</p>
      <p className="text-sm text-muted">
        Each works once in place of a code from your app, if you lose your phone. Print them or keep them in a password
        manager, not on the phone.
      </p>
      <ul data-testid="recovery-codes" className="mt-3 grid grid-cols-2 gap-1 font-mono">
        {codes.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </div>
  );
}
