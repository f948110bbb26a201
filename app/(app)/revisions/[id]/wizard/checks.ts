"use client";
/**
 * How the wizard reaches its schemas (validation.ts). They load when the adviser first reaches for the
 * form (a touch, a click or focus in it), not while the page starts on a phone. Until the first
 * change the wizard shows the server's results for the draft as saved; after it, results are worked
 * out here, and none is shown while the schemas are still loading.
 */
import { useSyncExternalStore } from "react";
import type { FieldValues, Resolver } from "react-hook-form";

export type Validation = typeof import("./validation");

let loading: Promise<Validation> | undefined;
let loaded: Validation | null = null;
const listeners = new Set<() => void>();

/** The schemas, loaded once; a failed load (a dropped connection) is tried again at the next call. */
export function loadValidation(): Promise<Validation> {
  loading ??= import("./validation").then(
    (v) => {
      loaded = v;
      for (const tell of listeners) tell();
      return v;
    },
    (err: unknown) => {
      loading = undefined;
      throw err;
    },
  );
  return loading;
}

/** A form resolver that loads the schemas the first time it is asked to check. */
export function lazyResolver<T extends FieldValues>(pick: (v: Validation) => Resolver<T>): Resolver<T> {
  return async (values, context, options) => pick(await loadValidation())(values, context, options);
}

/**
 * The schemas once loaded (by loadValidation, from anywhere); null until then. A load that fails
 * (offline) leaves results pending until a later one succeeds: the next check or save asks again.
 */
export function useValidation(): Validation | null {
  return useSyncExternalStore(subscribe, () => loaded, noneOnServer);
}

function subscribe(onLoaded: () => void) {
  listeners.add(onLoaded);
  return () => void listeners.delete(onLoaded);
}
const noneOnServer = () => null;

/** Starts loading the schemas, for an adviser about to use the form; a failure is retried later. */
export function readyValidation(): void {
  loadValidation().catch(() => undefined);
}
