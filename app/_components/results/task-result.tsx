import type { TaskScore } from "@/assessments/method-statement/score-task";
import { nothingReachesClear, type WhatIf } from "@/assessments/method-statement/what-if";
import { fmt } from "@/assessments/rules/format";
import type { Reason, Warning } from "@/assessments/rules/types";
import { SAFETY_CAUTION } from "../safety-caution";
import { BAND_MEANINGS, BandChip } from "./band";

/** Where the result will be while inputs are missing or out of range: a band is never shown for bad input. */
export function ResultPending({ children }: { children: React.ReactNode }) {
  return <p className="rounded-lg border border-dashed border-rule bg-white p-4 text-muted">{children}</p>;
}

function Factors({ rows }: { rows: [string, string][] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 text-sm tabular-nums">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-muted">{k}</dt>
          <dd className="font-bold">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

function Reasons({ reasons, warnings }: { reasons: Reason[]; warnings: Warning[] }) {
  return (
    <>
      {warnings.length > 0 && (
        <ul className="mt-2 space-y-1 text-sm">
          {warnings.map((w, i) => (
            <li key={i} className="rounded border-l-4 border-band-act bg-orange-50 px-2 py-1">
              <strong>Warning:</strong> {w.message}
            </li>
          ))}
        </ul>
      )}
      <ul className="mt-2 space-y-1 text-sm">
        {reasons.map((r, i) => (
          <li key={i}>
            {r.text} <span className="block text-xs text-muted">Source: {r.source}</span>
          </li>
        ))}
      </ul>
    </>
  );
}

const f = (x: number | null | undefined, dp: 0 | 1 | 2 = 2) => (x === null || x === undefined ? "—" : fmt(x, dp));

/** The changes the engine confirmed, each with the band it reaches when re-scored. */
function WhatIfList({ whatIf }: { whatIf: WhatIf }) {
  // Nothing to say only for a task that is Clear already.
  if (whatIf.suggestions.length === 0 && !whatIf.together && whatIf.reachesClear) return null;
  return (
    <div className="mt-3 rounded border border-rule bg-paper p-2 text-sm" data-testid="what-if">
      <h4 className="font-bold">What would bring it to clear</h4>
      <p className="text-xs text-muted">
        Each change below was re-scored by the same rules; the band is what it reaches.
      </p>
      {whatIf.suggestions.length > 0 && (
        <ul className="mt-1 space-y-1">
          {whatIf.suggestions.map((s) => (
            <li key={s.text} className="flex items-start justify-between gap-2" data-testid="what-if-suggestion">
              <span>{s.text}</span>
              <BandChip band={s.band} />
            </li>
          ))}
        </ul>
      )}
      {whatIf.together && (
        <p className="mt-2 flex items-start justify-between gap-2" data-testid="what-if-together">
          <span>
            <strong>Together:</strong> {whatIf.together.text.join("; ")}
          </span>
          <BandChip band={whatIf.together.band} />
        </p>
      )}
      {!whatIf.reachesClear && (
        <p className="mt-2 font-bold" data-testid="what-if-none">
          {nothingReachesClear(whatIf.bestBand)}
        </p>
      )}
    </div>
  );
}

/** Everything a task's score says: band, index, each factor, reasons with sources, warnings, what-if. */
export function TaskResult({ score }: { score: TaskScore }) {
  const { niosh, filter, push, lift } = score.results;
  return (
    <section aria-label="Result" data-testid="task-result" className="rounded-lg border border-rule bg-white p-3">
      <div className="flex flex-wrap items-center gap-3">
        <BandChip band={score.band} large />
        {score.band && <span className="text-sm text-muted">{BAND_MEANINGS[score.band]}</span>}
      </div>
      {score.load !== null && (
        <p className="mt-2 text-sm">
          Load <strong className="tabular-nums">{f(score.load)} kg</strong>
          {score.estimatedMass && (
            <span className="ml-2 rounded bg-band-watch px-1.5 py-0.5 text-xs font-bold text-white">
              Estimated mass — confirm by weighing
            </span>
          )}
        </p>
      )}
      {score.incomplete.length > 0 && (
        <ul className="mt-2 list-disc pl-5 text-sm text-muted">
          {score.incomplete.map((m) => (
            <li key={m}>To score this task: {m}.</li>
          ))}
        </ul>
      )}
      {niosh && (
        <div className="mt-3">
          <h4 className="font-bold">Revised NIOSH Lifting Equation</h4>
          <Factors
            rows={[
              ["Lifting index", f(niosh.li)],
              ["RWL (kg)", niosh.li === null ? "— (cannot judge)" : f(niosh.limit)],
              ["HM · VM · DM", `${f(niosh.origin.hm)} · ${f(niosh.origin.vm)} · ${f(niosh.origin.dm)}`],
              ["AM · FM · CM", `${f(niosh.origin.am)} · ${f(niosh.origin.fm)} · ${f(niosh.origin.cm)}`],
              ...(niosh.destination
                ? ([["At destination: RWL · LI", `${f(niosh.destination.rwl)} kg · ${f(niosh.destination.li)}`]] as [
                    string,
                    string,
                  ][])
                : []),
            ]}
          />
          <Reasons reasons={niosh.reasons} warnings={niosh.warnings} />
        </div>
      )}
      {filter && (
        <div className="mt-3">
          <h4 className="font-bold">
            Guideline weights{filter.inputs.teamSize > 1 ? ", team handling" : ""}
            {filter.inputs.carryDistanceM ? ", carrying" : ""}
          </h4>
          <Factors
            rows={[
              ["Index", f(filter.index)],
              ["Guideline (kg)", f(filter.guideline)],
              ["Table figure (kg)", f(filter.baseGuideline)],
              ["Kept after reductions", `${f(filter.reductionFactor * 100, 0)} %`],
              ...(filter.inputs.teamSize > 1
                ? ([["Each person carries (kg)", f(filter.perPersonLoad)]] as [string, string][])
                : []),
              ...(filter.cumulativeMassKg !== null
                ? ([["Mass per shift (kg)", f(filter.cumulativeMassKg, 0)]] as [string, string][])
                : []),
            ]}
          />
          <Reasons reasons={filter.reasons} warnings={filter.warnings} />
        </div>
      )}
      {push && (
        <div className="mt-3">
          <h4 className="font-bold">Pushing and pulling</h4>
          <Factors
            rows={[
              ["Index", f(push.index)],
              ["To start (N)", `${f(push.startForceN, 0)} of ${f(push.guidelineStartN, 0)}`],
              ["To keep moving (N)", `${f(push.sustainedForceN, 0)} of ${f(push.guidelineSustainedN, 0)}`],
              ...(push.inputs.braked
                ? ([["Holding and stopping", "by the brake"]] as [string, string][])
                : ([
                    ["To hold it on the slope (N)", `${f(push.holdForceN, 0)} of ${f(push.guidelineStartN, 0)}`],
                    ["To stop it (N)", `${f(push.stopForceN, 0)} of ${f(push.guidelineStartN, 0)}`],
                  ] as [string, string][])),
              ["Runs away if let go", push.runsAway ? "YES" : "no"],
            ]}
          />
          <Reasons reasons={push.reasons} warnings={push.warnings} />
        </div>
      )}
      {lift && (
        <div className="mt-3">
          <h4 className="font-bold">Lift plan — category {lift.category}</h4>
          <Factors
            rows={[
              ["Hook load (kg)", f(lift.hookLoad)],
              ["Utilisation", `${f(lift.utilisation * 100, 0)} %`],
              ["Leg tension (kg)", f(lift.legTension)],
              ["Sling rated (kg)", `${f(lift.slingWll)} ${lift.slingOk ? "— passes" : "— FAILS"}`],
              ...(lift.inputs.sling.markedWll !== undefined && lift.computedSlingWll !== lift.slingWll
                ? ([["Computed, above the marked limit (kg)", f(lift.computedSlingWll)]] as [string, string][])
                : []),
              ...(lift.ground
                ? ([
                    [
                      "Ground pressure (kPa)",
                      `${f(lift.ground.pressureKpa, 0)} of ${lift.ground.allowableKpa === null ? "— (no allowable value)" : f(lift.ground.allowableKpa, 0)}`,
                    ],
                  ] as [string, string][])
                : []),
            ]}
          />
          <Reasons reasons={lift.reasons} warnings={lift.warnings} />
        </div>
      )}
      {score.whatIf && <WhatIfList whatIf={score.whatIf} />}
      <p className="mt-3 text-xs text-muted">{SAFETY_CAUTION}</p>
    </section>
  );
}
