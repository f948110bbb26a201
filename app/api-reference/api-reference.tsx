"use client";

import { ApiReferenceReact } from "@scalar/api-reference-react";
import "@scalar/api-reference-react/style.css";

/**
 * The API reference, drawn by Scalar from /api/v1/openapi.json in the browser. Nothing is fetched
 * from elsewhere: no web fonts, no telemetry, no request proxy, no external client.
 */
export function ApiReference() {
  return (
    <ApiReferenceReact
      configuration={{
        url: "/api/v1/openapi.json",
        withDefaultFonts: false,
        telemetry: false,
        hideClientButton: true,
        hideDarkModeToggle: true,
        forceDarkModeState: "light",
        hideModels: false,
        metaData: { title: "Heftwise API reference" },
        agent: { disabled: true },
        showDeveloperTools: "never",
      }}
    />
  );
}
