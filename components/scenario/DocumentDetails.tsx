import type { ReactNode } from "react";
import {
  exact,
  formatAcceleration,
  formatCharge,
  formatDuration,
  formatLength,
  formatMass,
  formatRate,
} from "@/components/format/quantities";
import { backgroundName, placementNames, rampShapeNames } from "@/components/format/words";
import type { ProtocolSpec, ScenarioDocument } from "@/physics/scenario/schema";

/** A duration in tabular figures followed by the ramp's shape in words. */
function Ramp({ seconds, shape }: { seconds: number; shape: keyof typeof rampShapeNames }) {
  return (
    <>
      <span className="tabular">{formatDuration(seconds)}</span>
      <span className="text-ink-soft">, {rampShapeNames[shape]} ramp</span>
    </>
  );
}

/** A labelled value; numbers are set in tabular figures with their full precision on hover. */
function Row({ label, value, exactValue, mono = true }: { label: ReactNode; value: ReactNode; exactValue?: string; mono?: boolean }) {
  return (
    <div className="grid grid-cols-[minmax(8rem,14rem)_1fr] gap-4 border-b border-rule py-2 last:border-b-0">
      <dt className="text-ink-soft">{label}</dt>
      <dd className={mono ? "tabular" : ""} title={exactValue}>
        {value}
      </dd>
    </div>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section>
      <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">{title}</h3>
      <dl className="border-t border-ink/70 text-sm">{children}</dl>
    </section>
  );
}

function BackgroundRows({ background }: { background: ScenarioDocument["background"] }) {
  const kind = <Row label="Kind" value={backgroundName(background.kind)} mono={false} />;
  switch (background.kind) {
    case "minkowski":
      return kind;
    case "schwarzschild":
      return (
        <>
          {kind}
          <Row label="Black-hole mass M" value={formatMass(background.massKg)} exactValue={exact(background.massKg, "kg")} />
        </>
      );
    case "rindler":
      return (
        <>
          {kind}
          <Row
            label="Lab acceleration a"
            value={formatAcceleration(background.accelerationMetresPerSecondSquared)}
            exactValue={exact(background.accelerationMetresPerSecondSquared, "m/s²")}
          />
        </>
      );
    case "de-sitter":
      return (
        <>
          {kind}
          <Row label="Hubble rate H" value={formatRate(background.hubbleRatePerSecond)} exactValue={exact(background.hubbleRatePerSecond, "s⁻¹")} />
        </>
      );
  }
}

function LabRows({ lab }: { lab: ScenarioDocument["lab"] }) {
  const placement = <Row label="Placement" value={placementNames[lab.placement]} mono={false} />;
  switch (lab.placement) {
    case "inertial":
    case "uniformly-accelerated":
      return placement;
    case "areal-radius":
      return (
        <>
          {placement}
          <Row label="Areal radius r" value={formatLength(lab.arealRadiusMetres)} exactValue={exact(lab.arealRadiusMetres, "m")} />
        </>
      );
    case "proper-distance-from-horizon":
      return (
        <>
          {placement}
          <Row label="Proper distance from the horizon" value={formatLength(lab.properDistanceMetres)} exactValue={exact(lab.properDistanceMetres, "m")} />
        </>
      );
  }
}

function ProtocolRows({ protocol }: { protocol: ProtocolSpec }) {
  switch (protocol.kind) {
    case "segments": {
      const total = protocol.separation.durationSeconds + protocol.hold.durationSeconds + protocol.recombination.durationSeconds;
      return (
        <>
          <Row
            label="Separation"
            value={<Ramp seconds={protocol.separation.durationSeconds} shape={protocol.separation.shape} />}
            exactValue={exact(protocol.separation.durationSeconds, "s")}
            mono={false}
          />
          <Row label="Hold" value={formatDuration(protocol.hold.durationSeconds)} exactValue={exact(protocol.hold.durationSeconds, "s")} />
          <Row
            label="Recombination"
            value={<Ramp seconds={protocol.recombination.durationSeconds} shape={protocol.recombination.shape} />}
            exactValue={exact(protocol.recombination.durationSeconds, "s")}
            mono={false}
          />
          <Row label="Total, lab time" value={formatDuration(total)} exactValue={exact(total, "s")} />
        </>
      );
    }
    case "formula":
      return (
        <>
          <Row label="Profile σ(t)" value={<code className="break-all">{protocol.expression}</code>} />
          <Row label="Duration" value={formatDuration(protocol.durationSeconds)} exactValue={exact(protocol.durationSeconds, "s")} />
        </>
      );
    case "sampled": {
      // A loop, not Math.max(...samples): a profile may hold a million points.
      let first = Infinity;
      let last = -Infinity;
      let widest = 0;
      for (const sample of protocol.samples) {
        first = Math.min(first, sample.timeSeconds);
        last = Math.max(last, sample.timeSeconds);
        widest = Math.max(widest, Math.abs(sample.separationMetres));
      }
      const span = last - first;
      return (
        <>
          <Row label="Samples" value={protocol.samples.length.toLocaleString("en")} />
          <Row label="Time span" value={formatDuration(span)} exactValue={exact(span, "s")} />
          <Row label="Peak separation" value={formatLength(widest)} exactValue={exact(widest, "m")} />
          <Row label="Interpolation" value={protocol.interpolation === "cubic-spline" ? "cubic spline" : "linear"} mono={false} />
        </>
      );
    }
  }
}

const protocolKindNames: Record<ProtocolSpec["kind"], string> = {
  segments: "Protocol: separation, hold, recombination",
  formula: "Protocol: a formula",
  sampled: "Protocol: a measured profile",
};

/** Every part of a scenario document, with units. */
export function DocumentDetails({ document }: { document: ScenarioDocument }) {
  const { source, separation } = document;
  return (
    <div className="grid gap-x-12 gap-y-10 lg:grid-cols-2">
      <Section title="Background">
        <BackgroundRows background={document.background} />
      </Section>
      <Section title="Lab">
        <LabRows lab={document.lab} />
      </Section>
      <Section title="Source">
        <Row label="Charge q" value={formatCharge(source.chargeCoulombs)} exactValue={exact(source.chargeCoulombs, "C")} />
        <Row label="Mass m" value={formatMass(source.massKg)} exactValue={exact(source.massKg, "kg")} />
        <Row
          label="Lab mass (recoil)"
          value={source.labMassKg === null ? "not accounted for" : formatMass(source.labMassKg)}
          exactValue={source.labMassKg === null ? undefined : exact(source.labMassKg, "kg")}
          mono={source.labMassKg !== null}
        />
      </Section>
      <Section title="Separation">
        <Row label="Axis" value={separation.axis} mono={false} />
        <Row
          label="Split"
          value={separation.split === "symmetric" ? "symmetric: branch A and branch B each move d/2" : "one branch stays, the other moves d"}
          mono={false}
        />
        <Row label="Full separation d" value={formatLength(separation.distanceMetres)} exactValue={exact(separation.distanceMetres, "m")} />
        <Row
          label="Body offset x₀ from the lab's centre of mass"
          value={formatLength(separation.bodyOffsetMetres ?? 0)}
          exactValue={exact(separation.bodyOffsetMetres ?? 0, "m")}
        />
      </Section>
      <div className="lg:col-span-2">
        <Section title={protocolKindNames[document.protocol.kind]}>
          <ProtocolRows protocol={document.protocol} />
        </Section>
      </div>
    </div>
  );
}
