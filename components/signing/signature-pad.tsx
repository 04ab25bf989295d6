"use client";

import { useEffect, useRef } from "react";
import SignaturePad from "signature_pad";
import { Button } from "@/components/ui/button";

/** An optional drawn signature (finger, pen or mouse); hands back a PNG data URL, or null when empty. */
export function DrawnSignature({ onChange }: { onChange: (png: string | null) => void }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const pad = useRef<SignaturePad | null>(null);
  useEffect(() => {
    const el = canvas.current!;
    const ratio = Math.max(window.devicePixelRatio || 1, 1);
    el.width = el.offsetWidth * ratio;
    el.height = el.offsetHeight * ratio;
    el.getContext("2d")!.scale(ratio, ratio);
    const p = new SignaturePad(el, { penColor: "#0b2545", backgroundColor: "rgba(0,0,0,0)" });
    p.addEventListener("endStroke", () => onChange(p.isEmpty() ? null : p.toDataURL("image/png")));
    pad.current = p;
    return () => p.off();
  }, [onChange]);
  return (
    <div>
      <p className="text-sm font-semibold text-slate-800">Drawn signature (optional)</p>
      <canvas ref={canvas} aria-label="Signature pad: draw your signature" className="mt-1 h-28 w-full max-w-md touch-none rounded-md border border-dashed border-slate-400 bg-white" />
      <Button type="button" variant="secondary" className="mt-1 min-h-8 px-2 py-1" onClick={() => { pad.current?.clear(); onChange(null); }}>Clear the drawing</Button>
    </div>
  );
}
