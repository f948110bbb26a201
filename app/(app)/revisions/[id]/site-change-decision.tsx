"use client";
/**
 * The decision form on a revision with reported site changes, loaded only where it is shown: on
 * every other revision's page (the wizard's above all) its form checks stay off the phone.
 */
import dynamic from "next/dynamic";

export const SiteChangeDecision = dynamic(() => import("./site-change-review").then((m) => m.SiteChangeDecision));
