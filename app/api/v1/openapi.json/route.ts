import { NextResponse } from "next/server";
import { openApiDocument } from "@/assessments/openapi";

// Describes the API only; no data. Public, so tools can read it before signing in.
export function GET() {
  return NextResponse.json(openApiDocument());
}
