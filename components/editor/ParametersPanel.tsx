"use client";

/** Parameters: the background and its parameter, where the lab is, the source, how the branches separate, and the lab's environment. */
import { useMemo, type ReactNode } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { compactNumber } from "@/canvas/kernels/diagram/labels";
import { withBackgroundKind, withLabPlacement } from "@/canvas/kernels/document-edits";
import { withPeakSeparation } from "@/canvas/kernels/protocol-kind";
import { schwarzschildRadiusMetres } from "@/physics/backgrounds";
import { c, elementaryCharge } from "@/physics/constants";
import type { BackgroundKind, LabPlacement, ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity, namedLengthsText, parseQuantity, type LengthScales } from "@/physics/units";
import { EnvironmentFields } from "./EnvironmentFields";
import { DraftField, QuantityField, type ParseResult } from "./QuantityField";
import { useEdit } from "./useEdit";

const BACKGROUND_WORDS: Record<BackgroundKind, string> = {
  minkowski: "Minkowski",
  schwarzschild: "Schwarzschild",
  rindler: "Rindler wedge",
  "de-sitter": "de Sitter static patch",
};

const selectClass = "mt-1 block w-full rounded border border-rule-strong bg-white px-2 py-1.5 text-sm text-ink disabled:cursor-not-allowed disabled:bg-paper-deep disabled:text-ink-soft";

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="space-y-3 border-t border-rule pt-3">
      <legend className="pr-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">{title}</legend>
      {children}
    </fieldset>
  );
}

function Choice<T extends string>({ label, value, options, onChange, disabled, name }: {
  label: string; value: T; options: { value: T; words: string }[]; onChange(value: T): void; disabled: boolean; name: string;
}) {
  return (
    <div role="radiogroup" aria-label={label}>
      <div className="text-sm font-semibold text-ink">{label}</div>
      <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
        {options.map((o) => (
          <label key={o.value} className="flex items-center gap-1.5 text-sm">
            <input type="radio" name={name} value={o.value} checked={value === o.value} disabled={disabled} onChange={() => onChange(o.value)} />
            {o.words}
          </label>
        ))}
      </div>
    </div>
  );
}

/** What the Parameters set: everything but the protocol (so a drag in the Offsets panel leaves this panel alone). */
type PhysicalSetup = Pick<ScenarioDocument, "background" | "lab" | "source" | "separation">;

function BackgroundFields({ document, readOnly }: { document: PhysicalSetup; readOnly: boolean }) {
  const edit = useEdit();
  const bg = document.background;
  return (
    <Group title="Background">
      <label className="block text-sm font-semibold text-ink">
        Kind of background
        <select
          className={selectClass}
          value={bg.kind}
          disabled={readOnly}
          data-testid="background-kind"
          onChange={(e) => edit("Change background", (d) => withBackgroundKind(d, e.target.value as BackgroundKind))}
        >
          {Object.entries(BACKGROUND_WORDS).map(([kind, words]) => (
            <option key={kind} value={kind}>
              {words}
            </option>
          ))}
        </select>
      </label>
      {bg.kind === "schwarzschild" && (
        <QuantityField
          label="Black-hole mass"
          dimension="mass"
          hint="In kg or solar masses, e.g. 10 Msun"
          valueSI={bg.massKg}
          shown={formatQuantity(bg.massKg, "mass", { solarMasses: true, digits: 4 })}
          disabled={readOnly}
          onCommit={(massKg) => edit("Set black-hole mass", (d) => ({ ...d, background: { kind: "schwarzschild", massKg } }))}
        />
      )}
      {bg.kind === "rindler" && (
        <QuantityField
          label="Lab acceleration"
          dimension="acceleration"
          hint="e.g. 9.81 m/s^2; the horizon is c²/a behind the lab"
          shown={formatQuantity(bg.accelerationMetresPerSecondSquared, "acceleration", { digits: 4 })}
          disabled={readOnly}
          onCommit={(a) => edit("Set lab acceleration", (d) => ({ ...d, background: { kind: "rindler", accelerationMetresPerSecondSquared: a } }))}
        />
      )}
      {bg.kind === "de-sitter" && (
        <QuantityField
          label="Hubble rate"
          dimension="rate"
          hint="e.g. 2.2e-18 1/s"
          shown={formatQuantity(bg.hubbleRatePerSecond, "rate", { digits: 4 })}
          disabled={readOnly}
          onCommit={(h) => edit("Set Hubble rate", (d) => ({ ...d, background: { kind: "de-sitter", hubbleRatePerSecond: h } }))}
        />
      )}
    </Group>
  );
}

const PLACEMENT_WORDS: Record<BackgroundKind, Partial<Record<LabPlacement["placement"], string>>> = {
  minkowski: { inertial: "at rest (inertial)" },
  rindler: { "uniformly-accelerated": "uniformly accelerated, c²/a from the horizon" },
  schwarzschild: { "areal-radius": "areal radius", "proper-distance-from-horizon": "proper distance above the horizon" },
  "de-sitter": { "areal-radius": "areal radius (0: the static geodesic observer at the centre)", "proper-distance-from-horizon": "proper distance inward from the horizon" },
};

/**
 * The lab's acceleration, redshift and local temperature from the latest Budget. Each is read as a number, so a new
 * Budget every frame of a drag (a new summary object, the same values) re-renders nothing here.
 */
function LabSummary() {
  const computed = useEditor((s) => s.budget.result !== null);
  const acceleration = useEditor((s) => s.budget.result?.background.labProperAcceleration.value ?? null);
  const redshift = useEditor((s) => s.budget.result?.background.labRedshiftFactor.value ?? null);
  const temperature = useEditor((s) => s.budget.result?.background.labLocalTemperature.value ?? null);
  if (!computed) return null;
  return (
    <dl className="grid grid-cols-2 gap-x-3 gap-y-0.5 text-xs text-ink-soft">
      <dt>Lab acceleration</dt>
      <dd className="tabular">{acceleration === null ? "—" : formatQuantity(acceleration, "acceleration")}</dd>
      <dt>Redshift factor</dt>
      <dd className="tabular">{redshift === null ? "—" : compactNumber(redshift)}</dd>
      <dt>Local temperature</dt>
      <dd className="tabular">{temperature === null ? "—" : `${compactNumber(temperature)} K`}</dd>
    </dl>
  );
}

/** The background's own lengths: r_s = 2GM/c² (and GM/c²) around a black hole, c/H in de Sitter. */
function lengthScalesOf(background: ScenarioDocument["background"]): LengthScales {
  if (background.kind === "schwarzschild") return { schwarzschildRadiusMetres: schwarzschildRadiusMetres(background.massKg) };
  if (background.kind === "de-sitter") return { hubbleRadiusMetres: c / background.hubbleRatePerSecond };
  return {};
}

/** "e.g. 3 rs or 6 GM/c^2" for the lengths a background has, so a reader knows they are accepted. */
function lengthHint(metres: number, scales: LengthScales): string | undefined {
  const readout = namedLengthsText(metres, scales);
  if (!readout) return undefined;
  return `${readout}; type e.g. ${scales.schwarzschildRadiusMetres !== undefined ? "3 rs or 6 GM/c^2" : "0.5 c/H"}, or in metres`;
}

function LabFields({ document, readOnly }: { document: PhysicalSetup; readOnly: boolean }) {
  const edit = useEdit();
  const placements = PLACEMENT_WORDS[document.background.kind];
  const lab = document.lab;
  const scales = lengthScalesOf(document.background);
  return (
    <Group title="Lab">
      {Object.keys(placements).length > 1 ? (
        <label className="block text-sm font-semibold text-ink">
          Place the lab by
          <select
            className={selectClass}
            value={lab.placement}
            disabled={readOnly}
            onChange={(e) => edit("Change how the lab is placed", (d) => withLabPlacement(d, e.target.value as LabPlacement["placement"]))}
          >
            {Object.entries(placements).map(([placement, words]) => (
              <option key={placement} value={placement}>
                {words}
              </option>
            ))}
          </select>
        </label>
      ) : (
        <p className="text-sm text-ink-soft">The lab is {Object.values(placements)[0]}.</p>
      )}
      {lab.placement === "areal-radius" && (
        <QuantityField
          label="Areal radius"
          dimension="length"
          lengthScales={scales}
          valueSI={lab.arealRadiusMetres}
          hint={lengthHint(lab.arealRadiusMetres, scales)}
          shown={formatQuantity(lab.arealRadiusMetres, "length", { digits: 5 })}
          disabled={readOnly}
          testId="lab-areal-radius"
          onCommit={(r) => edit("Set lab radius", (d) => ({ ...d, lab: { placement: "areal-radius", arealRadiusMetres: r } }))}
        />
      )}
      {lab.placement === "proper-distance-from-horizon" && (
        <QuantityField
          label={document.background.kind === "de-sitter" ? "Proper distance inward from the horizon" : "Proper distance above the horizon"}
          dimension="length"
          lengthScales={scales}
          valueSI={lab.properDistanceMetres}
          hint={lengthHint(lab.properDistanceMetres, scales)}
          shown={formatQuantity(lab.properDistanceMetres, "length", { digits: 5 })}
          disabled={readOnly}
          onCommit={(l) => edit("Set lab distance", (d) => ({ ...d, lab: { placement: "proper-distance-from-horizon", properDistanceMetres: l } }))}
        />
      )}
      <LabSummary />
    </Group>
  );
}

/** A charge that is a whole number of elementary charges (up to a million), shown in e rather than in coulombs. */
function isWholeMultiple(inE: number): boolean {
  return inE !== 0 && Math.abs(inE) <= 1e6 && Math.abs(inE - Math.round(inE)) < 1e-6;
}

/** A mass, or nothing at all (empty text): the lab's mass is optional. */
function parseOptionalMass(text: string): ParseResult<number | null> {
  if (text.trim() === "") return { ok: true, value: null };
  const parsed = parseQuantity(text, "mass");
  if (!parsed.ok) return parsed;
  return parsed.valueSI > 0 ? { ok: true, value: parsed.valueSI } : { ok: false, message: "the lab's mass must be positive; leave the field empty for none" };
}

function SourceFields({ document, readOnly, measuredProfile }: { document: PhysicalSetup; readOnly: boolean; measuredProfile: boolean }) {
  const edit = useEdit();
  const { source, separation } = document;
  return (
    <>
      <Group title="Source">
        <QuantityField
          label="Charge"
          dimension="charge"
          hint={`= ${compactNumber(source.chargeCoulombs / elementaryCharge.value, 4)} e = ${formatQuantity(source.chargeCoulombs, "charge", { digits: 4 })}; type e.g. 100 e or 1.6e-17 C`}
          valueSI={source.chargeCoulombs}
          initialUnit={isWholeMultiple(source.chargeCoulombs / elementaryCharge.value) ? "e" : undefined}
          shown={formatQuantity(source.chargeCoulombs, "charge", { digits: 4 })}
          disabled={readOnly}
          onCommit={(q) => edit("Set charge", (d) => ({ ...d, source: { ...d.source, chargeCoulombs: q } }))}
        />
        <QuantityField
          label="Mass"
          dimension="mass"
          valueSI={source.massKg}
          shown={formatQuantity(source.massKg, "mass", { digits: 4 })}
          disabled={readOnly}
          onCommit={(m) => edit("Set source mass", (d) => ({ ...d, source: { ...d.source, massKg: m } }))}
        />
        <DraftField<number | null>
          label="Lab mass"
          hint="For the lab's recoil, which keeps the centre of mass fixed; leave empty for a lab too heavy to recoil."
          shown={source.labMassKg === null ? "" : formatQuantity(source.labMassKg, "mass", { digits: 4 })}
          parse={parseOptionalMass}
          disabled={readOnly}
          testId="lab-mass"
          onCommit={(labMassKg) => edit(labMassKg === null ? "Clear lab mass" : "Set lab mass", (d) => ({ ...d, source: { ...d.source, labMassKg } }))}
        />
      </Group>
      <Group title="Separation">
        <Choice
          label="Axis"
          name="separation-axis"
          value={separation.axis}
          disabled={readOnly}
          options={[
            { value: "radial", words: "radial" },
            { value: "tangential", words: "tangential" },
          ]}
          onChange={(axis) => edit("Set separation axis", (d) => ({ ...d, separation: { ...d.separation, axis } }))}
        />
        <Choice
          label="Split"
          name="separation-split"
          value={separation.split}
          disabled={readOnly}
          options={[
            { value: "symmetric", words: "symmetric (±d/2)" },
            { value: "one-branch-stays", words: "branch B stays" },
          ]}
          onChange={(split) => edit("Set how the branches split", (d) => ({ ...d, separation: { ...d.separation, split } }))}
        />
        <QuantityField
          label="Full separation d"
          dimension="length"
          hint={measuredProfile ? "The measured profile's peak: a new value rescales the profile's samples." : lengthHint(separation.distanceMetres, lengthScalesOf(document.background))}
          lengthScales={lengthScalesOf(document.background)}
          valueSI={separation.distanceMetres}
          shown={formatQuantity(separation.distanceMetres, "length", { digits: 4 })}
          disabled={readOnly}
          testId="separation-distance"
          onCommit={(m) => edit("Set separation", (d) => withPeakSeparation(d, m))}
        />
      </Group>
    </>
  );
}

export function ParametersPanel() {
  const background = useEditor((s) => s.document.background);
  const lab = useEditor((s) => s.document.lab);
  const source = useEditor((s) => s.document.source);
  const separation = useEditor((s) => s.document.separation);
  const document = useMemo(() => ({ background, lab, source, separation }), [background, lab, source, separation]);
  const environment = useEditor((s) => s.document.environment);
  const readOnly = useEditor((s) => s.readOnly);
  const measuredProfile = useEditor((s) => s.document.protocol.kind === "sampled");
  return (
    <section aria-labelledby="parameters-heading" className="space-y-4">
      <h2 id="parameters-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Parameters
      </h2>
      <BackgroundFields document={document} readOnly={readOnly} />
      <LabFields document={document} readOnly={readOnly} />
      <SourceFields document={document} readOnly={readOnly} measuredProfile={measuredProfile} />
      <EnvironmentFields environment={environment} readOnly={readOnly} />
    </section>
  );
}
