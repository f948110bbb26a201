"use client";

import { forwardRef, useEffect, useImperativeHandle, useRef } from "react";
import SignaturePad from "signature_pad";

export interface SignatureFieldHandle {
  /** PNG data URL of the drawing, or null when nothing is drawn. */
  toDataUrl: () => string | null;
  clear: () => void;
}

/** A box to sign in with a finger, a stylus or a mouse. */
export const SignatureField = forwardRef<SignatureFieldHandle, { label: string; error?: string }>(
  function SignatureField({ label, error }, ref) {
    const canvas = useRef<HTMLCanvasElement>(null);
    const pad = useRef<SignaturePad | null>(null);

    useEffect(() => {
      const el = canvas.current!;
      const resize = () => {
        // Match the canvas to its box and the screen's pixel ratio, or strokes land off the pointer.
        // At most twice the CSS size: sharp enough on any screen, and within the server's pixel limit.
        const ratio = Math.min(Math.max(window.devicePixelRatio || 1, 1), 2);
        const data = pad.current?.toData();
        el.width = el.offsetWidth * ratio;
        el.height = el.offsetHeight * ratio;
        el.getContext("2d")!.scale(ratio, ratio);
        pad.current?.clear();
        if (data) pad.current?.fromData(data);
      };
      pad.current = new SignaturePad(el, { penColor: "#16302b", minWidth: 1, maxWidth: 2.8 });
      resize();
      window.addEventListener("resize", resize);
      return () => {
        window.removeEventListener("resize", resize);
        pad.current?.off();
      };
    }, []);

    useImperativeHandle(ref, () => ({
      toDataUrl: () => (pad.current && !pad.current.isEmpty() ? pad.current.toDataURL("image/png") : null),
      clear: () => pad.current?.clear(),
    }));

    return (
      <div>
        <div className="flex items-end justify-between">
          <span className="text-sm font-bold">{label}</span>
          <button
            type="button"
            className="text-sm font-bold text-accent underline"
            onClick={() => pad.current?.clear()}
          >
            Clear
          </button>
        </div>
        <canvas
          ref={canvas}
          data-testid="signature-pad"
          aria-label={label}
          className={`mt-1 block h-40 w-full touch-none rounded border-2 bg-white ${error ? "border-danger" : "border-rule"}`}
        />
        {error && (
          <p role="alert" className="mt-1 text-sm font-bold text-danger">
            {error}
          </p>
        )}
      </div>
    );
  },
);
