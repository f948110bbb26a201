/** The caution every result screen and every PDF carries: the work can hurt someone. */
export const SAFETY_CAUTION =
  "Heftwise supports, and does not replace, the judgement of a competent person. Check every result on site, and follow local regulations, your organisation's procedures and licensed practice.";

export function SafetyCaution({ className = "" }: { className?: string }) {
  return (
    <p role="note" className={`border-l-4 border-band-watch bg-white/70 px-3 py-2 text-sm text-muted ${className}`}>
      <strong className="text-ink">Caution.</strong> {SAFETY_CAUTION}
    </p>
  );
}
