/** The pack's content as HTML, for the Chromium side of `npm run bench:pack` only. */
import { OPERATION_LABELS } from "@/assessments/method-statement/options";
import { PACK_CAUTION, type PackInput } from "@/assessments/pack/document";

const esc = (s: unknown) =>
  String(s ?? "").replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);

/** Fonts (the same files, as data URLs), the QR code, the signature and a drawn sling per lift: the same content as the PDF. */
export function packHtml(
  input: PackInput,
  fonts: { regular: Uint8Array; bold: Uint8Array },
  qrPng: Uint8Array,
): string {
  const font = (bytes: Uint8Array, weight: number) =>
    `@font-face{font-family:Pack;font-weight:${weight};src:url(data:font/ttf;base64,${Buffer.from(bytes).toString("base64")})}`;
  const png = (bytes: Uint8Array) => `data:image/png;base64,${Buffer.from(bytes).toString("base64")}`;
  const sling = (legs: number, angle: number, tension: number) => {
    const spread = Math.tan((angle * Math.PI) / 180) * 100;
    const xs = Array.from({ length: legs }, (_, i) =>
      legs === 1 ? 150 : 150 - spread + (2 * spread * i) / (legs - 1),
    );
    return `<svg width="300" height="150" viewBox="0 0 300 150">${xs.map((x) => `<line x1="150" y1="10" x2="${x}" y2="110" stroke="#16302b" stroke-width="2"/>`).join("")}<rect x="80" y="110" width="140" height="30" fill="#b7791f"/><text x="20" y="60">${tension.toFixed(0)} kg</text></svg>`;
  };
  const tasks = input.content.tasks
    .map((t, i) => {
      const s = input.scores[i];
      const results = Object.values(s.results)
        .map(
          (r) =>
            `<h4>${esc(r.method)} — index ${esc(r.index?.toFixed(2))}</h4><ul>${r.reasons.map((x) => `<li>${esc(x.text)}<br><small>${esc(x.source)}</small></li>`).join("")}</ul>`,
        )
        .join("");
      const lift = s.results.lift;
      return `<section><h2>Task ${i + 1}: ${esc(t.description)}</h2><p><b>${esc(s.band)}</b> · ${esc(OPERATION_LABELS[t.operation])} · ${esc(s.load)} kg</p>${lift ? sling(lift.inputs.sling.legs, lift.inputs.sling.angleFromVerticalDeg, lift.legTension) : ""}${results}</section>`;
    })
    .join("");
  const hazards = input.content.hazards
    .map(
      (h) =>
        `<tr><td>${esc(h.hazard)}</td><td>${esc(h.whoIsAtRisk)}</td><td>${h.controls.map((c) => esc(c.text)).join("<br>")}</td></tr>`,
    )
    .join("");
  return `<!doctype html><html><head><meta charset="utf-8"><style>${font(fonts.regular, 400)}${font(fonts.bold, 700)}body{font-family:Pack,sans-serif;font-size:10pt;margin:2cm}h2{border-bottom:1px solid #ccc}table{border-collapse:collapse;width:100%}td{border:1px solid #ccc;padding:4px}footer{font-size:7pt;color:#555}</style></head><body>
<h1>${esc(input.title)}</h1><img src="${png(qrPng)}" width="110" height="110" alt="QR"><p>${esc(input.organisation)} · ${esc(input.job.name)} · revision ${input.revision.number}</p>
${tasks}<h2>Hazard register</h2><table>${hazards}</table>${input.signatures.map((g) => `<p><img src="${png(g.png)}" height="60" alt="signature"> ${esc(g.name)}, ${esc(g.role)}</p>`).join("")}<footer>${esc(PACK_CAUTION)}</footer></body></html>`;
}
