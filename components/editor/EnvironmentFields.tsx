"use client";

/**
 * The Parameters panel's Environment section: a preset to start from, then the body (radius, material or ε,
 * internal temperature), the residual gas, the thermal radiation of the surroundings and a nearby surface, each
 * added or removed on its own. Quantities are typed with their units; every change is one undo step.
 */
import { memo, type ReactNode } from "react";
import {
  ENVIRONMENT_PRESET_WORDS,
  withEnvironmentChange,
  withEnvironmentPart,
  withEnvironmentPreset,
  withNewEnvironmentPart,
  type EnvironmentPresetName,
} from "@/canvas/kernels/environment-edits";
import { bodyMaterials, gasSpecies } from "@/physics/environment";
import type { EnvironmentSpec } from "@/physics/scenario/environment-schema";
import { formatQuantity, parseQuantity } from "@/physics/units";
import { buttonStyles } from "@/components/ui/styles";
import { DraftField, QuantityField, type ParseResult } from "./QuantityField";
import { useEdit } from "./useEdit";

type Spec = NonNullable<EnvironmentSpec>;
type Part = keyof Spec;

const selectClass = "mt-1 block w-full rounded border border-rule-strong bg-white px-2 py-1.5 text-sm text-ink disabled:cursor-not-allowed disabled:bg-paper-deep disabled:text-ink-soft";

const PART_WORDS: Record<Part, string> = { body: "the body", gas: "residual gas", radiation: "thermal radiation", surface: "a nearby surface" };

function parseNumber(what: string) {
  return (text: string): ParseResult<number> => {
    const value = Number(text.trim().replace(/−/g, "-"));
    return text.trim() !== "" && Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `${what} must be a plain number, e.g. 5.7` };
  };
}

/** A temperature, or nothing (empty text): the body's internal temperature defaults to the surroundings'. */
function parseOptionalTemperature(text: string): ParseResult<number | null> {
  if (text.trim() === "") return { ok: true, value: null };
  const parsed = parseQuantity(text, "temperature", { defaultUnit: "K" });
  return parsed.ok ? { ok: true, value: parsed.valueSI } : parsed;
}

function Sub({ title, part, present, readOnly, children }: { title: string; part: Part; present: boolean; readOnly: boolean; children: ReactNode }) {
  const edit = useEdit();
  return (
    <div className="space-y-2 rounded border border-rule px-2 py-2" data-testid={`environment-${part}`}>
      <div className="flex items-baseline justify-between gap-2">
        <span className="text-sm font-semibold text-ink">{title}</span>
        {!readOnly && (
          <button
            type="button"
            className={buttonStyles.row}
            onClick={() => edit(present ? `Remove ${PART_WORDS[part]}` : `Add ${PART_WORDS[part]}`, (d) => (present ? withEnvironmentPart(d, part, null) : withNewEnvironmentPart(d, part)))}
          >
            {present ? "Remove" : "Add"}
          </button>
        )}
      </div>
      {present ? children : <p className="text-xs text-ink-faint">None.</p>}
    </div>
  );
}

const temperatureText = (kelvin: number) => formatQuantity(kelvin, "temperature", { digits: 4 });

function BodyFields({ body, readOnly }: { body: NonNullable<Spec["body"]>; readOnly: boolean }) {
  const edit = useEdit();
  const set = (label: string, change: Partial<typeof body>) => edit(label, (d) => withEnvironmentChange(d, "body", change));
  const material = body.permittivity ? "given" : (body.material ?? "fused-silica");
  return (
    <>
      <QuantityField label="Body radius" dimension="length" shown={formatQuantity(body.radiusMetres, "length", { digits: 4 })} disabled={readOnly} testId="environment-body-radius" onCommit={(radiusMetres) => set("Set body radius", { radiusMetres })} />
      <label className="block text-sm font-semibold text-ink">
        Material
        <select
          className={selectClass}
          value={material}
          disabled={readOnly}
          data-testid="environment-body-material"
          onChange={(e) =>
            e.target.value === "given"
              ? set("Give the body's permittivity", { material: null, permittivity: bodyMaterials["fused-silica"].permittivity })
              : set("Set body material", { material: e.target.value as keyof typeof bodyMaterials, permittivity: null })
          }
        >
          {Object.entries(bodyMaterials).map(([key, entry]) => (
            <option key={key} value={key}>
              {entry.name}
            </option>
          ))}
          <option value="given">ε given directly</option>
        </select>
      </label>
      {body.permittivity ? (
        <div className="grid grid-cols-2 gap-2">
          <DraftField compact label="ε′ (real)" shown={String(body.permittivity.real)} parse={parseNumber("ε′")} disabled={readOnly} onCommit={(real) => set("Set body ε′", { permittivity: { ...body.permittivity!, real } })} />
          <DraftField compact label="ε″ (imaginary)" shown={String(body.permittivity.imaginary)} parse={parseNumber("ε″")} disabled={readOnly} onCommit={(imaginary) => set("Set body ε″", { permittivity: { ...body.permittivity!, imaginary } })} />
        </div>
      ) : (
        <p className="text-xs text-ink-faint">{bodyMaterials[material as keyof typeof bodyMaterials].reference}</p>
      )}
      <DraftField<number | null>
        label="Internal temperature"
        hint="For thermal emission; leave empty for the surroundings' temperature."
        shown={body.internalTemperatureKelvin === null ? "" : temperatureText(body.internalTemperatureKelvin)}
        parse={parseOptionalTemperature}
        disabled={readOnly}
        onCommit={(internalTemperatureKelvin) => set("Set internal temperature", { internalTemperatureKelvin })}
      />
    </>
  );
}

function GasFields({ gas, readOnly }: { gas: NonNullable<Spec["gas"]>; readOnly: boolean }) {
  const edit = useEdit();
  const set = (label: string, change: Partial<typeof gas>) => edit(label, (d) => withEnvironmentChange(d, "gas", change));
  return (
    <>
      <QuantityField label="Gas pressure" dimension="pressure" hint="e.g. 1e-8 mbar or 1e-6 Pa" shown={formatQuantity(gas.pressurePascals, "pressure", { digits: 4 })} disabled={readOnly} testId="environment-gas-pressure" onCommit={(pressurePascals) => set("Set gas pressure", { pressurePascals })} />
      <QuantityField label="Gas temperature" dimension="temperature" defaultUnit="K" shown={temperatureText(gas.temperatureKelvin)} disabled={readOnly} onCommit={(temperatureKelvin) => set("Set gas temperature", { temperatureKelvin })} />
      <label className="block text-sm font-semibold text-ink">
        Species
        <select className={selectClass} value={gas.species} disabled={readOnly} onChange={(e) => set("Set gas species", { species: e.target.value as typeof gas.species })}>
          {Object.entries(gasSpecies).map(([key, entry]) => (
            <option key={key} value={key}>
              {entry.name}
            </option>
          ))}
        </select>
      </label>
    </>
  );
}

function SurfaceFields({ surface, readOnly }: { surface: NonNullable<Spec["surface"]>; readOnly: boolean }) {
  const edit = useEdit();
  const set = (label: string, change: Partial<typeof surface>) => edit(label, (d) => withEnvironmentChange(d, "surface", change));
  const byPermittivity = surface.permittivity !== null;
  return (
    <>
      <QuantityField label="Surface distance" dimension="length" hint="Height of the body's rest position above the plane" shown={formatQuantity(surface.distanceMetres, "length", { digits: 4 })} disabled={readOnly} testId="environment-surface-distance" onCommit={(distanceMetres) => set("Set surface distance", { distanceMetres })} />
      <label className="block text-sm font-semibold text-ink">
        The surface is given by
        <select
          className={selectClass}
          value={byPermittivity ? "permittivity" : "resistivity"}
          disabled={readOnly}
          onChange={(e) =>
            e.target.value === "permittivity"
              ? set("Give the surface's permittivity", { resistivityOhmMetres: null, permittivity: { real: 3.9, imaginary: 0.01, atFrequencyHertz: 1e6 } })
              : set("Give the surface's resistivity", { resistivityOhmMetres: 2.2e-8, permittivity: null })
          }
        >
          <option value="resistivity">its resistivity (a conductor)</option>
          <option value="permittivity">its permittivity (a lossy dielectric)</option>
        </select>
      </label>
      {surface.resistivityOhmMetres !== null && (
        <QuantityField label="Resistivity" dimension="resistivity" hint="e.g. 2.2e-8 ohm m (gold)" shown={formatQuantity(surface.resistivityOhmMetres, "resistivity", { digits: 4 })} disabled={readOnly} onCommit={(resistivityOhmMetres) => set("Set surface resistivity", { resistivityOhmMetres })} />
      )}
      {surface.permittivity && (
        <div className="grid grid-cols-2 gap-2">
          <DraftField compact label="ε′ (real)" shown={String(surface.permittivity.real)} parse={parseNumber("ε′")} disabled={readOnly} onCommit={(real) => set("Set surface ε′", { permittivity: { ...surface.permittivity!, real } })} />
          <DraftField compact label="ε″ (imaginary)" shown={String(surface.permittivity.imaginary)} parse={parseNumber("ε″")} disabled={readOnly} onCommit={(imaginary) => set("Set surface ε″", { permittivity: { ...surface.permittivity!, imaginary } })} />
          <div className="col-span-2">
            <QuantityField compact label="at frequency" dimension="rate" hint="e.g. 1e6 1/s" shown={formatQuantity(surface.permittivity.atFrequencyHertz, "rate", { digits: 4 })} disabled={readOnly} onCommit={(atFrequencyHertz) => set("Set the permittivity's frequency", { permittivity: { ...surface.permittivity!, atFrequencyHertz } })} />
          </div>
        </div>
      )}
      <QuantityField label="Surface temperature" dimension="temperature" defaultUnit="K" shown={temperatureText(surface.temperatureKelvin)} disabled={readOnly} onCommit={(temperatureKelvin) => set("Set surface temperature", { temperatureKelvin })} />
      <div role="radiogroup" aria-label="Separation against the surface">
        <div className="text-sm font-semibold text-ink">Separation against the surface</div>
        <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
          {(["parallel", "perpendicular"] as const).map((orientation) => (
            <label key={orientation} className="flex items-center gap-1.5 text-sm">
              <input type="radio" name="surface-orientation" value={orientation} checked={surface.orientation === orientation} disabled={readOnly} onChange={() => set("Set the separation's orientation", { orientation })} />
              {orientation}
            </label>
          ))}
        </div>
      </div>
    </>
  );
}

export const EnvironmentFields = memo(function EnvironmentFields({ environment, readOnly }: { environment: EnvironmentSpec | null; readOnly: boolean }) {
  const edit = useEdit();
  const env = environment;
  return (
    <fieldset className="space-y-3 border-t border-rule pt-3" data-testid="environment">
      <legend className="pr-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">Environment</legend>
      <label className="block text-sm font-semibold text-ink">
        Start from a preset
        <select
          className={selectClass}
          value=""
          disabled={readOnly}
          data-testid="environment-preset"
          onChange={(e) => {
            const preset = e.target.value as EnvironmentPresetName;
            if (preset) edit(`Environment: ${ENVIRONMENT_PRESET_WORDS[preset]}`, (d) => withEnvironmentPreset(d, preset));
          }}
        >
          <option value="">choose…</option>
          {Object.entries(ENVIRONMENT_PRESET_WORDS).map(([key, words]) => (
            <option key={key} value={key}>
              {words}
            </option>
          ))}
        </select>
      </label>
      {!env && <p className="text-xs text-ink-faint">An isolated body: no gas, no thermal radiation, no surface.</p>}
      <Sub title="Body" part="body" present={!!env?.body} readOnly={readOnly}>
        {env?.body && <BodyFields body={env.body} readOnly={readOnly} />}
      </Sub>
      <Sub title="Residual gas" part="gas" present={!!env?.gas} readOnly={readOnly}>
        {env?.gas && <GasFields gas={env.gas} readOnly={readOnly} />}
      </Sub>
      <Sub title="Thermal radiation" part="radiation" present={!!env?.radiation} readOnly={readOnly}>
        {env?.radiation && (
          <QuantityField
            label="Surroundings temperature"
            dimension="temperature"
            defaultUnit="K"
            hint="The walls or the radiation shield the body sees"
            shown={temperatureText(env.radiation.surroundingsTemperatureKelvin)}
            disabled={readOnly}
            testId="environment-surroundings-temperature"
            onCommit={(surroundingsTemperatureKelvin) => edit("Set surroundings temperature", (d) => withEnvironmentChange(d, "radiation", { surroundingsTemperatureKelvin }))}
          />
        )}
      </Sub>
      <Sub title="Nearby surface" part="surface" present={!!env?.surface} readOnly={readOnly}>
        {env?.surface && <SurfaceFields surface={env.surface} readOnly={readOnly} />}
      </Sub>
    </fieldset>
  );
});
