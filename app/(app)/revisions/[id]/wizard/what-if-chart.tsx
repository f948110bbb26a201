"use client";

import { useState } from "react";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { Task } from "@/assessments/method-statement/content";
import { scoreTask, type RegisterEntry } from "@/assessments/method-statement/score-task";

interface Variable {
  key: string;
  label: string;
  unit: string;
  range: [number, number];
  apply: (task: Task, component: RegisterEntry, x: number) => [Task, RegisterEntry];
}

const withLoad = (task: Task, c: RegisterEntry, x: number): [Task, RegisterEntry] => [task, { ...c, massKg: x / (task.quantity || 1) }];

function variablesFor(task: Task): Variable[] {
  switch (task.operation) {
    case "lift":
      return [
        { key: "load", label: "Load", unit: "kg", range: [1, 50], apply: withLoad },
        { key: "h", label: "H at origin", unit: "cm", range: [20, 70], apply: (t, c, x) => [{ ...t, niosh: { ...t.niosh!, origin: { ...t.niosh!.origin, h: x } } }, c] },
        { key: "f", label: "Lifts a minute", unit: "/min", range: [0.2, 12], apply: (t, c, x) => [{ ...t, niosh: { ...t.niosh!, frequency: x } }, c] },
      ];
    case "team-lift":
    case "carry":
      return [
        { key: "load", label: "Load", unit: "kg", range: [1, 80], apply: withLoad },
        { key: "f", label: "Operations a minute", unit: "/min", range: [0, 14], apply: (t, c, x) => [{ ...t, filter: { ...t.filter!, frequency: x } }, c] },
        { key: "twist", label: "Twist", unit: "°", range: [0, 120], apply: (t, c, x) => [{ ...t, filter: { ...t.filter!, twistDeg: x } }, c] },
      ];
    case "push":
      return [
        { key: "mass", label: "Trolley mass", unit: "kg", range: [50, 1000], apply: (t, c, x) => [{ ...t, push: { ...t.push!, mass: x } }, c] },
        { key: "gradient", label: "Gradient (rise ÷ run)", unit: "", range: [0, 0.15], apply: (t, c, x) => [{ ...t, push: { ...t.push!, gradient: x } }, c] },
      ];
    default:
      return [];
  }
}

/** How the task's index moves as one chosen variable changes, the others held as entered. */
export function WhatIfChart({ task, component }: { task: Task; component: RegisterEntry | undefined }) {
  const variables = variablesFor(task);
  const [key, setKey] = useState(variables[0]?.key);
  const variable = variables.find((v) => v.key === key) ?? variables[0];
  // 41 scorings: cheap enough to redo on every render.
  const data = (() => {
    if (!variable || !component) return [];
    const [lo, hi] = variable.range;
    return Array.from({ length: 41 }, (_, i) => {
      const x = lo + ((hi - lo) * i) / 40;
      const [t, c] = variable.apply(task, component, x);
      const s = scoreTask(t, c);
      const index = Object.values(s.results).reduce<number | null>((worst, r) => (r.index === null ? worst : Math.max(worst ?? 0, r.index)), null);
      return { x: Math.round(x * 100) / 100, index: index === null ? null : Math.min(index, 5) };
    });
  })();
  if (!variable || !component) return null;
  return (
    <figure className="rounded-lg border border-rule bg-white p-3" aria-label="What if">
      <figcaption className="flex flex-wrap items-center gap-2 text-sm font-bold">
        What if:
        <select aria-label="Variable to vary" value={variable.key} onChange={(e) => setKey(e.target.value)} className="rounded border border-rule px-2 py-1 font-normal">
          {variables.map((v) => (
            <option key={v.key} value={v.key}>
              {v.label}
            </option>
          ))}
        </select>
        <span className="font-normal text-muted">changes, everything else as entered (index shown up to 5)</span>
      </figcaption>
      <div className="h-48 w-full">
        <ResponsiveContainer>
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 4, left: 0 }}>
            <CartesianGrid stroke="#e4e1d6" />
            <XAxis dataKey="x" type="number" domain={variable.range} tick={{ fontSize: 11 }} unit={variable.unit ? ` ${variable.unit}` : ""} />
            <YAxis domain={[0, 5]} tick={{ fontSize: 11 }} width={32} />
            <Tooltip formatter={(v) => [typeof v === "number" ? v.toFixed(2) : String(v), "index"]} />
            <ReferenceLine y={1} stroke="#0f766e" strokeDasharray="4 4" label={{ value: "1: clear up to here", fontSize: 10, position: "insideTopLeft" }} />
            <ReferenceLine y={3} stroke="#1b1b1b" strokeDasharray="4 4" />
            <Line type="monotone" dataKey="index" stroke="#b83a0b" strokeWidth={2} dot={false} isAnimationActive={false} connectNulls={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
