"use client";

import { useState } from "react";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { Task } from "@/assessments/method-statement/content";
import { rateTask, type RegisterEntry } from "@/assessments/method-statement/score-task";
import type { Band } from "@/assessments/rules/types";
import { BAND_LABELS } from "@/app/_components/results/band";

interface Variable {
  key: string;
  label: string;
  unit: string;
  range: [number, number];
  current: (task: Task, component: RegisterEntry) => number;
  apply: (task: Task, component: RegisterEntry, x: number) => [Task, RegisterEntry];
}

/** The band colours of globals.css, for the chart's points. */
const BAND_COLOUR: Record<Band, string> = { clear: "#0f766e", watch: "#8a5a0b", act: "#b83a0b", stop: "#1b1b1b" };
const INDEX_CAP = 5;

const load: Variable = {
  key: "load",
  label: "Load",
  unit: "kg",
  range: [1, 80],
  current: (t, c) => c.massKg * (t.quantity || 1),
  apply: (t, c, x) => [t, { ...c, massKg: x / (t.quantity || 1) }],
};

function variablesFor(task: Task): Variable[] {
  switch (task.operation) {
    case "lift":
      return [
        { ...load, range: [1, 50] },
        {
          key: "h",
          label: "H at origin",
          unit: "cm",
          range: [20, 70],
          current: (t) => t.niosh!.origin.h,
          apply: (t, c, x) => [{ ...t, niosh: { ...t.niosh!, origin: { ...t.niosh!.origin, h: x } } }, c],
        },
        {
          key: "f",
          label: "Lifts a minute",
          unit: "/min",
          range: [0.2, 12],
          current: (t) => t.niosh!.frequency,
          apply: (t, c, x) => [{ ...t, niosh: { ...t.niosh!, frequency: x } }, c],
        },
      ];
    case "team-lift":
    case "carry":
      return [
        load,
        {
          key: "f",
          label: "Operations a minute",
          unit: "/min",
          range: [0, 14],
          current: (t) => t.filter!.frequency,
          apply: (t, c, x) => [{ ...t, filter: { ...t.filter!, frequency: x } }, c],
        },
        {
          key: "twist",
          label: "Twist",
          unit: "°",
          range: [0, 120],
          current: (t) => t.filter!.twistDeg,
          apply: (t, c, x) => [{ ...t, filter: { ...t.filter!, twistDeg: x } }, c],
        },
        ...(task.operation === "carry"
          ? [
              {
                key: "carry",
                label: "Carry distance",
                unit: "m",
                range: [0, 60],
                current: (t: Task) => t.filter!.carryDistanceM ?? 0,
                apply: (t: Task, c: RegisterEntry, x: number) => [
                  { ...t, filter: { ...t.filter!, carryDistanceM: x } },
                  c,
                ],
              } as Variable,
            ]
          : []),
      ];
    case "push":
      return [
        {
          key: "mass",
          label: "Loaded mass",
          unit: "kg",
          range: [50, 1000],
          current: (t) => t.push!.mass,
          apply: (t, c, x) => [{ ...t, push: { ...t.push!, mass: x } }, c],
        },
        {
          key: "gradient",
          label: "Gradient (rise ÷ run, negative downhill)",
          unit: "",
          range: [-0.1, 0.1],
          current: (t) => t.push!.gradient,
          apply: (t, c, x) => [{ ...t, push: { ...t.push!, gradient: x } }, c],
        },
      ];
    default:
      return [];
  }
}

/**
 * How the task's result moves as one chosen variable changes, the others held as entered. Each
 * point is scored by the same rules as the result beside it and coloured by its band, so the chart,
 * the band and the what-if list agree; the dashed line marks the value entered.
 */
export function WhatIfChart({ task, component }: { task: Task; component: RegisterEntry | undefined }) {
  const variables = variablesFor(task);
  const [key, setKey] = useState(variables[0]?.key);
  const variable = variables.find((v) => v.key === key) ?? variables[0];
  if (!variable || !component) return null;
  const now = variable.current(task, component);
  const lo = Math.min(variable.range[0], now);
  const hi = Math.max(variable.range[1], now);
  // 41 scorings: cheap enough to redo on every render.
  const data = Array.from({ length: 41 }, (_, i) => {
    const x = lo + ((hi - lo) * i) / 40;
    const s = rateTask(...variable.apply(task, component, x));
    // A method that cannot judge the point leaves no index: the point sits at the top, as Stop does,
    // rather than following another method's index.
    let index: number | null = null;
    let unjudged = false;
    for (const r of Object.values(s.results)) {
      if (r.index === null) unjudged = true;
      else index = Math.max(index ?? 0, r.index);
    }
    const shown = unjudged ? INDEX_CAP : index === null ? null : Math.min(index, INDEX_CAP);
    return { x: Math.round(x * 1000) / 1000, index: shown, band: s.band };
  });
  return (
    <figure className="rounded-lg border border-rule bg-white p-3" aria-label="What if">
      <figcaption className="flex flex-wrap items-center gap-2 text-sm font-bold">
        What if:
        <select
          aria-label="Variable to vary"
          value={variable.key}
          onChange={(e) => setKey(e.target.value)}
          className="rounded border border-rule px-2 py-1 font-normal"
        >
          {variables.map((v) => (
            <option key={v.key} value={v.key}>
              {v.label}
            </option>
          ))}
        </select>
        <span className="font-normal text-muted">
          changes, everything else as entered. Points are coloured by band; index shown up to {INDEX_CAP}.
        </span>
      </figcaption>
      <div className="h-48 w-full">
        <ResponsiveContainer>
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 4, left: 0 }}>
            <CartesianGrid stroke="#e4e1d6" />
            <XAxis
              dataKey="x"
              type="number"
              domain={[lo, hi]}
              tick={{ fontSize: 11 }}
              unit={variable.unit ? ` ${variable.unit}` : ""}
            />
            <YAxis domain={[0, INDEX_CAP]} tick={{ fontSize: 11 }} width={32} />
            <Tooltip
              formatter={(v, _n, item) => [
                `${typeof v === "number" ? v.toFixed(2) : String(v)} — ${item.payload.band ? BAND_LABELS[item.payload.band as Band] : "not scored"}`,
                "index",
              ]}
            />
            <ReferenceLine
              y={1}
              stroke="#0f766e"
              strokeDasharray="4 4"
              label={{ value: "1: clear up to here", fontSize: 10, position: "insideTopLeft" }}
            />
            <ReferenceLine
              x={Math.round(now * 1000) / 1000}
              stroke="#17201c"
              strokeDasharray="2 3"
              label={{ value: "as entered", fontSize: 10, position: "insideTopRight" }}
            />
            <Line
              type="monotone"
              dataKey="index"
              stroke="#9a9486"
              strokeWidth={1.5}
              isAnimationActive={false}
              connectNulls={false}
              dot={(props: { cx?: number; cy?: number; index?: number; payload?: { band: Band | null } }) => (
                <circle
                  key={props.index}
                  cx={props.cx}
                  cy={props.cy}
                  r={3}
                  fill={props.payload?.band ? BAND_COLOUR[props.payload.band] : "transparent"}
                  stroke="none"
                />
              )}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
