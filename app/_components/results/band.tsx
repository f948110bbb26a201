import type { Band } from "@/assessments/rules/types";

export const BAND_LABELS: Record<Band, string> = { clear: "Clear", watch: "Watch", act: "Act", stop: "Stop" };
export const BAND_MEANINGS: Record<Band, string> = {
  clear: "Within guidance.",
  watch: "Reduce the risk as far as reasonably practicable.",
  act: "Redesign before work: a mechanical aid, smaller loads or a bigger team.",
  stop: "Do not proceed as planned.",
};

const STYLE: Record<Band, string> = {
  clear: "bg-band-clear text-white",
  watch: "bg-band-watch text-white",
  act: "bg-band-act text-white",
  stop: "band-stop-hatch text-white",
};

/** Heftwise's band marker: colour and the word, never colour alone. */
export function BandChip({ band, large = false }: { band: Band | null; large?: boolean }) {
  if (!band)
    return (
      <span
        className={`inline-block rounded border border-dashed border-muted px-2 py-0.5 font-bold text-muted ${large ? "text-lg" : "text-sm"}`}
      >
        Not scored
      </span>
    );
  return (
    <span
      data-band={band}
      className={`inline-block rounded px-2 py-0.5 font-bold uppercase tracking-wide ${STYLE[band]} ${large ? "px-3 py-1 text-lg" : "text-sm"}`}
    >
      {BAND_LABELS[band]}
    </span>
  );
}
