import { HITCH_LABELS, SINGLE_SLING_HITCHES, type Hitch } from "@/assessments/lift-plan/sling";
import { fmt } from "@/assessments/rules/format";

/**
 * The sling as planned: hook, legs at their angle from vertical, each leg's tension, the load, and
 * the hitch — straight legs to the lifting points, a choke round the load, a basket or an endless
 * sling passing under it. A 4-leg sling shows four legs, with a note that only three share the load.
 */
export function SlingDiagram({
  legs,
  angleDeg,
  tension,
  legWll,
  load,
  hitch = "straight",
}: {
  legs: number;
  angleDeg: number;
  tension: number;
  legWll: number;
  load: number;
  hitch?: Hitch;
}) {
  const hook = { x: 200, y: 40 };
  const drop = 150;
  const spread = Math.tan((Math.min(Math.max(angleDeg, 0), 60) * Math.PI) / 180) * drop;
  const bottom = hook.y + drop;
  const single = SINGLE_SLING_HITCHES.includes(hitch);
  // A basket or endless sling has two parts; parallel parts are drawn a little apart.
  const ends = single
    ? [hook.x - Math.max(spread, 24), hook.x + Math.max(spread, 24)]
    : legs === 1
      ? [hook.x]
      : legs === 2
        ? [hook.x - spread, hook.x + spread]
        : legs === 3
          ? [hook.x - spread, hook.x, hook.x + spread]
          : [hook.x - spread, hook.x - spread / 3, hook.x + spread / 3, hook.x + spread];
  const over = !single && tension > legWll * (hitch === "choked" ? 0.8 : 1);
  const loadWidth = Math.max(120, ends[ends.length - 1] - ends[0] + 40);
  const stroke = over ? "#b83a0b" : "#16302b";
  const top = single ? hook.y + 4 : hook.y;
  return (
    <svg
      viewBox="0 0 400 290"
      role="img"
      aria-labelledby="sling-title"
      className="w-full max-w-md"
      data-testid="sling-diagram"
      data-hitch={hitch}
    >
      <title id="sling-title">{`${single ? "One sling" : `${legs}-leg sling`}, ${HITCH_LABELS[hitch]}, ${fmt(angleDeg, 1)}° from vertical, ${fmt(tension, 0)} kg per ${single ? "part" : "leg"}`}</title>
      {/* hook */}
      <path d={`M${hook.x} 8 v14 a10 10 0 1 1 -10 10`} stroke="#17201c" strokeWidth="4" fill="none" />
      <circle cx={hook.x} cy={hook.y} r="5" fill="#17201c" />
      {(legs > 1 || single) && angleDeg > 0 && (
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
          <line
            x1={single ? hook.x + (x < hook.x ? -4 : 4) : hook.x}
            y1={top}
            x2={x}
            y2={bottom}
            stroke={stroke}
            strokeWidth="4"
          />
          {hitch === "choked" || hitch === "endless-choked" ? (
            <circle cx={x} cy={bottom + 8} r="8" stroke={stroke} strokeWidth="3" fill="none" data-testid="choke" />
          ) : null}
          <text
            x={(hook.x + x) / 2 + (x < hook.x ? -8 : 8)}
            y={(hook.y + bottom) / 2 + 30}
            fontSize="12"
            textAnchor={x < hook.x ? "end" : "start"}
            fill={over ? "#b83a0b" : "#17201c"}
            fontWeight="700"
          >
            {legs === 4 && !single && (i === 1 || i === 2) ? "" : `${fmt(tension, 0)} kg`}
          </text>
        </g>
      ))}
      <rect x={hook.x - loadWidth / 2} y={bottom} width={loadWidth} height="50" rx="4" fill="#8a5a0b" />
      {single && (
        // The sling passes under the load from one part to the other.
        <path
          d={`M${ends[0]} ${bottom} V${bottom + 56} H${ends[1]} V${bottom}`}
          stroke={stroke}
          strokeWidth="4"
          fill="none"
          data-testid="under-load"
        />
      )}
      <text x={hook.x} y={bottom + 30} fontSize="14" textAnchor="middle" fill="#fff" fontWeight="700">
        {fmt(load, 0)} kg
      </text>
      <text x="8" y="262" fontSize="11" fill="#4b5a54">
        Hitch: {HITCH_LABELS[hitch]}.
      </text>
      <text x="8" y="280" fontSize="11" fill="#4b5a54">
        {legs === 4 && !single ? "4 legs drawn; 3 taken to share the load. " : ""}
        {single ? `Sling WLL ${fmt(legWll, 0)} kg straight` : `Leg WLL ${fmt(legWll, 0)} kg`}
        {over ? " — exceeded" : ""}
      </text>
    </svg>
  );
}
