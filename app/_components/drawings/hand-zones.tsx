import { ZONE_LABELS, ZONES } from "@/assessments/rules/filter";

/**
 * Heftwise's own drawing of a person seen from the side: the five hand-height zones of the guideline
 * filter as bands, and how H (hands forward of the ankles) and V (hands above the floor) are measured.
 */
const BANDS: { zone: (typeof ZONES)[number]; top: number; bottom: number }[] = [
  { zone: "shoulder-to-reach", top: 20, bottom: 62 },
  { zone: "elbow-to-shoulder", top: 62, bottom: 104 },
  { zone: "knuckle-to-elbow", top: 104, bottom: 140 },
  { zone: "lower-leg-to-knuckle", top: 140, bottom: 186 },
  { zone: "floor-to-lower-leg", top: 186, bottom: 220 },
];

export function HandZonesDrawing({ highlight }: { highlight?: (typeof ZONES)[number] }) {
  return (
    <svg viewBox="0 0 340 236" role="img" aria-labelledby="hz-title" className="w-full max-w-sm">
      <title id="hz-title">Hand-height zones, and how H and V are measured</title>
      {BANDS.map((b, i) => (
        <g key={b.zone}>
          <rect
            x="0"
            y={b.top}
            width="340"
            height={b.bottom - b.top}
            fill={b.zone === highlight ? "#cdeae6" : i % 2 ? "#f1eee5" : "#faf8f2"}
          />
          <text
            x="336"
            y={(b.top + b.bottom) / 2 + 4}
            textAnchor="end"
            fontSize="10"
            fill="#17201c"
            fontWeight={b.zone === highlight ? 700 : 400}
          >
            {ZONE_LABELS[b.zone]}
          </text>
        </g>
      ))}
      <line x1="0" y1="220" x2="340" y2="220" stroke="#17201c" strokeWidth="2" />
      {/* figure */}
      <g stroke="#16302b" strokeWidth="5" strokeLinecap="round" fill="none">
        <circle cx="70" cy="38" r="12" fill="#16302b" />
        <line x1="70" y1="52" x2="70" y2="128" />
        <line x1="70" y1="128" x2="64" y2="176" />
        <line x1="64" y1="176" x2="66" y2="218" />
        <line x1="70" y1="66" x2="84" y2="100" />
        <line x1="84" y1="100" x2="122" y2="118" />
      </g>
      <rect x="118" y="104" width="40" height="26" rx="3" fill="#8a5a0b" />
      {/* H */}
      <g stroke="#b83a0b" strokeWidth="2" markerEnd="url(#hz-arrow)">
        <line x1="66" y1="228" x2="136" y2="228" />
      </g>
      <line x1="136" y1="130" x2="136" y2="232" stroke="#b83a0b" strokeDasharray="3 3" />
      <text x="100" y="234" fontSize="11" fontWeight="700" fill="#b83a0b" textAnchor="middle">
        H
      </text>
      {/* V */}
      <g stroke="#0f766e" strokeWidth="2" markerEnd="url(#hz-arrow-v)">
        <line x1="176" y1="220" x2="176" y2="121" />
      </g>
      <line x1="138" y1="118" x2="182" y2="118" stroke="#0f766e" strokeDasharray="3 3" />
      <text x="184" y="174" fontSize="11" fontWeight="700" fill="#0f766e">
        V
      </text>
      <defs>
        <marker id="hz-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto">
          <path d="M0 0 L10 5 L0 10 z" fill="#b83a0b" />
        </marker>
        <marker id="hz-arrow-v" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto">
          <path d="M0 0 L10 5 L0 10 z" fill="#0f766e" />
        </marker>
      </defs>
    </svg>
  );
}
