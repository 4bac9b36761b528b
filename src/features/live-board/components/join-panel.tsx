import { useEffect, useState } from "react";
import { PeopleIcon } from "@/components/ui/icons";

/**
 * How to join, readable from the back of the room: the lesson code in big monospace and the QR
 * code of the join address (dark on light, which phone cameras read best), both over 3 % of the
 * screen's height; and how many pupils have joined (a number, never names).
 */
export function JoinPanel({ code, joinUrl, joined }: { code: string; joinUrl: string; joined: number }) {
  const [svg, setSvg] = useState<string | null>(null);

  useEffect(() => {
    let cancelled = false;
    import("qrcode")
      .then((QR) => QR.toString(joinUrl, { type: "svg", margin: 1, errorCorrectionLevel: "M", color: { dark: "#0A0F19", light: "#FFFFFF" } }))
      .then((text) => !cancelled && setSvg(text))
      .catch(() => !cancelled && setSvg(null));
    return () => {
      cancelled = true;
    };
  }, [joinUrl]);

  const spaced = code.length === 6 ? `${code.slice(0, 3)} ${code.slice(3)}` : code;
  return (
    <section aria-label="How to join" className="flex items-center gap-[2vh]">
      {svg ? (
        <div
          role="img"
          aria-label={`QR code for ${joinUrl}`}
          className="size-[max(6rem,16vh)] shrink-0 rounded-control bg-white p-1 [&>svg]:h-full [&>svg]:w-full"
          // The SVG is made here by the qrcode package from the join address.
          dangerouslySetInnerHTML={{ __html: svg }}
        />
      ) : null}
      <div>
        <p className="text-[max(1rem,2.4vh)] text-ink-muted">Scan the code, or go to {joinUrl.replace(/^https?:\/\//, "")} and type</p>
        <p className="font-mono text-[max(2.5rem,7vh)] font-bold leading-none tracking-[0.12em]" aria-label={`Lesson code ${code.split("").join(" ")}`}>
          {spaced}
        </p>
        <p className="mt-1 flex items-center gap-2 text-[max(1rem,3vh)] font-bold" aria-live="polite">
          <PeopleIcon className="size-[1em]" />
          {joined} joined
        </p>
      </div>
    </section>
  );
}
