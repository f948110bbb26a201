import { fmt } from "@/assessments/rules/format";

/**
 * The sling as planned: hook, legs at their angle from vertical, each leg's tension, and the load.
 * A 4-leg sling shows four legs, with a note that only three are taken to share the load.
 */
export function SlingDiagram({ legs, angleDeg, tension, legWll, load }: { legs: number; angleDeg: number; tension: number; legWll: number; load: number }) {
  const hook = { x: 200, y: 40 };
  const drop = 150;
  const spread = Math.tan((Math.min(Math.max(angleDeg, 0), 60) * Math.PI) / 180) * drop;
  const bottom = hook.y + drop;
  const ends =
    legs === 1
      ? [hook.x]
      : legs === 2
        ? [hook.x - spread, hook.x + spread]
        : legs === 3
          ? [hook.x - spread, hook.x, hook.x + spread]
          : [hook.x - spread, hook.x - spread / 3, hook.x + spread / 3, hook.x + spread];
  const over = tension > legWll;
  const loadWidth = Math.max(120, spread * 2 + 40);
  return (
    <svg viewBox="0 0 400 280" role="img" aria-labelledby="sling-title" className="w-full max-w-md" data-testid="sling-diagram">
      <title id="sling-title">{`${legs}-leg sling at ${fmt(angleDeg, 1)}° from vertical, ${fmt(tension, 0)} kg per leg`}</title>
      {/* hook */}
      <path d={`M${hook.x} 8 v14 a10 10 0 1 1 -10 10`} stroke="#17201c" strokeWidth="4" fill="none" />
      <circle cx={hook.x} cy={hook.y} r="5" fill="#17201c" />
      {/* vertical reference and angle */}
      {legs > 1 && (
        <>
          <line x1={hook.x} y1={hook.y} x2={hook.x} y2={bottom} stroke="#4b5a54" strokeDasharray="4 4" />
          <path
            d={`M${hook.x} ${hook.y + 50} A50 50 0 0 1 ${hook.x + 50 * Math.sin((angleDeg * Math.PI) / 180)} ${hook.y + 50 * Math.cos((angleDeg * Math.PI) / 180)}`}
            stroke="#0f766e"
            strokeWidth="2"
            fill="none"
          />
          <text x={hook.x + 22} y={hook.y + 72} fontSize="13" fill="#0f766e" fontWeight="700">
            β {fmt(angleDeg, 1)}°
          </text>
        </>
      )}
      {ends.map((x, i) => (
        <g key={i}>
          <line x1={hook.x} y1={hook.y} x2={x} y2={bottom} stroke={over ? "#b83a0b" : "#16302b"} strokeWidth="4" />
          <text x={(hook.x + x) / 2 + (x < hook.x ? -8 : 8)} y={(hook.y + bottom) / 2 + 30} fontSize="12" textAnchor={x < hook.x ? "end" : "start"} fill={over ? "#b83a0b" : "#17201c"} fontWeight="700">
            {legs === 4 && (i === 1 || i === 2) ? "" : `${fmt(tension, 0)} kg`}
          </text>
        </g>
      ))}
      <rect x={hook.x - loadWidth / 2} y={bottom} width={loadWidth} height="50" rx="4" fill="#8a5a0b" />
      <text x={hook.x} y={bottom + 30} fontSize="14" textAnchor="middle" fill="#fff" fontWeight="700">
        {fmt(load, 0)} kg
      </text>
      <text x="8" y="272" fontSize="11" fill="#4b5a54">
        {legs === 4 ? "4 legs drawn; 3 taken to share the load. " : ""}Leg WLL {fmt(legWll, 0)} kg{over ? " — exceeded" : ""}
      </text>
    </svg>
  );
}
