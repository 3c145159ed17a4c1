import { formatDuration, formatLength } from "@/components/format/quantities";

interface ProfileSketchProps {
  samples: { timeSeconds: number; separationMetres: number }[];
  durationSeconds: number;
  maxSeparationMetres: number;
}

const WIDTH = 320;
const HEIGHT = 150;
const PAD = { left: 8, right: 8, top: 10, bottom: 22 };
/** Enough points for a sketch this size; a long file is thinned evenly (its first and last samples kept). */
const MAX_POINTS = 600;

/** A small picture of separation against time, straight lines between the samples, axes labelled with units. */
export function ProfileSketch({ samples, durationSeconds, maxSeparationMetres }: ProfileSketchProps) {
  const step = Math.max(1, Math.ceil(samples.length / MAX_POINTS));
  const shown = samples.filter((_, i) => i % step === 0 || i === samples.length - 1);
  const t0 = samples[0]?.timeSeconds ?? 0;
  const span = durationSeconds > 0 ? durationSeconds : 1;
  const peak = maxSeparationMetres > 0 ? maxSeparationMetres : 1;
  const x = (t: number) => PAD.left + ((t - t0) / span) * (WIDTH - PAD.left - PAD.right);
  const y = (d: number) => HEIGHT - PAD.bottom - (d / peak) * (HEIGHT - PAD.top - PAD.bottom);
  const points = shown.map((s) => `${x(s.timeSeconds).toFixed(1)},${y(s.separationMetres).toFixed(1)}`).join(" ");
  return (
    <figure className="m-0">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} className="h-auto w-full" role="img" aria-label={`Separation against time: up to ${formatLength(maxSeparationMetres)} over ${formatDuration(durationSeconds)}`}>
        <line x1={PAD.left} y1={HEIGHT - PAD.bottom} x2={WIDTH - PAD.right} y2={HEIGHT - PAD.bottom} className="stroke-rule-strong" strokeWidth={1} />
        <line x1={PAD.left} y1={y(peak)} x2={WIDTH - PAD.right} y2={y(peak)} className="stroke-rule" strokeWidth={1} strokeDasharray="3 3" />
        <polyline points={points} fill="none" className="stroke-ink" strokeWidth={1.5} strokeLinejoin="round" />
        <text x={PAD.left} y={HEIGHT - 6} className="fill-ink-faint font-mono text-[10px]">
          0
        </text>
        <text x={WIDTH - PAD.right} y={HEIGHT - 6} textAnchor="end" className="fill-ink-faint font-mono text-[10px]">
          {formatDuration(durationSeconds)}
        </text>
        <text x={WIDTH - PAD.right} y={y(peak) - 3} textAnchor="end" className="fill-ink-faint font-mono text-[10px]">
          {formatLength(maxSeparationMetres)}
        </text>
      </svg>
      <figcaption className="text-xs text-ink-faint">Separation against lab time, from the first sample.</figcaption>
    </figure>
  );
}
