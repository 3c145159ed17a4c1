import type { Metadata } from "next";
import Link from "next/link";
import "katex/dist/katex.min.css";
import { Formula } from "@/components/methods/Formula";
import { SourceEntryCard } from "@/components/methods/SourceEntryCard";
import { sources, type SourceKey } from "@/physics";

export const metadata: Metadata = { title: "Methods" };

const groups: { id: string; title: string; intro: string; keys: SourceKey[]; more?: { href: string; label: string } }[] = [
  {
    id: "flat",
    title: "Flat spacetime: quanta radiated to null infinity",
    intro:
      "Only the ramps radiate; a held superposition does not decohere in flat spacetime. For smooth ramps of duration T the photon count falls as 1/T² (Larmor: ω³|Δp̃|² with Δp̃ ∝ T) and the graviton count as 1/T⁴ (quadrupole formula: ω⁵|ΔĨ|² with ΔĨ ∝ T). A velocity jump makes the photon count grow with the bandwidth, an acceleration jump the graviton count.",
    keys: ["far-field-em", "far-field-gw", "source-strength-em", "source-strength-gw"],
  },
  {
    id: "rindler-de-sitter",
    title: "Rindler wedge and de Sitter static patch: one spectral count",
    intro:
      "Along a static worldline outside a Killing horizon the field noise is thermal. The spectral formula holds every quantum once — those through the horizon are the same as those reaching infinity — so it is split by frequency into hold-driven and ramp-driven parts, never added to a far-field count.",
    keys: ["rindler-em", "rindler-gw", "de-sitter-em", "de-sitter-gw", "spectral-split"],
  },
  {
    id: "schwarzschild",
    more: { href: "/methods/schwarzschild-exact", label: "The exact horizon rate at any radius: derivation, checks and the ratio to the far-zone estimate" },
    title: "Schwarzschild: quanta into the horizon and to null infinity ℐ⁺",
    intro:
      "Outside a black hole two counts add: the held superposition's field change is absorbed by the horizon at a steady rate (into the horizon), and the ramps radiate — to null infinity ℐ⁺ when they are slow and the lab is far from the hole (β²·f times the flat count, from the static Copson–Linet dipole), mostly into the horizon when the lab is near it (the Rindler count at the lab's acceleration). Between those limits the ramps' count is interpolated and flagged with the size of its uncertainty. The hold rates are zero-frequency limits: the flag hold-timescale checks that the time apart is long against GM/c³ and b/c.",
    keys: [
      "schwarzschild-far-em",
      "schwarzschild-far-gw",
      "schwarzschild-near-em",
      "schwarzschild-near-gw",
      "schwarzschild-interpolated-em",
      "schwarzschild-interpolated-gw",
      "schwarzschild-ramps",
    ],
  },
  {
    id: "environment",
    more: { href: "/methods/environment", label: "The lab's environment: derivations, checks, and a horizon beside a warm metal plate" },
    title: "The lab's environment: gas, thermal radiation, a warm surface",
    intro:
      "Beside the body's own fields, the lab's environment resolves the path too. Each channel is counted in the same quanta, ⟨N⟩ = 2∫F dt over the branch paths, the ramps included.",
    keys: [
      "environment-gas",
      "environment-thermal-scattering",
      "environment-thermal-absorption",
      "environment-thermal-emission",
      "environment-surface",
      "environment-budget-total",
      "environment-margin",
    ],
  },
  {
    id: "coherence",
    title: "From quanta to coherence",
    intro: "",
    keys: ["decoherence", "visibility", "decoherence-time", "combined-channels"],
  },
  { id: "lab", title: "The lab and its protocol", intro: "", keys: ["background-lab", "protocol-kinematics"] },
];

/** Why the de Sitter rate off the centre is exact, and its closed form (sources.ts "de-sitter-em"). */
function DeSitterDerivation() {
  return (
    <section id="de-sitter-exact" className="mt-6 rounded border border-rule bg-white/50 p-5 scroll-mt-20">
      <h2 className="font-serif text-lg font-semibold">de Sitter off the centre: exact, not an estimate</h2>
      <p className="mt-2 text-sm leading-relaxed">
        In the conformally flat slicing <Formula tex="g = \Omega^2\eta" /> of de Sitter, a lab held static at radius{" "}
        <Formula tex="r" /> moves on a uniformly accelerated line of Minkowski space. Maxwell&apos;s equations are conformally
        invariant in four dimensions and the Bunch–Davies state is the conformal vacuum, so the electric field along the lab
        is the Minkowski vacuum&apos;s along that line, with the field&apos;s conformal weight cancelling against the lab&apos;s proper
        time. The spectrum is therefore exactly the Rindler one at
      </p>
      <Formula display tex="\alpha = \frac{\sqrt{a^2 + c^2H^2}}{c} = \frac{H}{\sqrt{1 - H^2r^2/c^2}},\qquad a = \frac{H^2 r}{\sqrt{1 - H^2r^2/c^2}}," />
      <p className="text-sm leading-relaxed">and the hold rate per second of the lab&apos;s proper time is, in closed form,</p>
      <Formula display tex="\frac{d\langle N\rangle}{d\tau} = \frac{q^2d^2\alpha^3}{6\pi^2\varepsilon_0\hbar} = \frac{q^2 d^2 H^3}{6\pi^2\varepsilon_0\hbar c^3\,(1 - H^2r^2/c^2)^{3/2}}." />
      <p className="text-sm leading-relaxed">
        The code&apos;s value is tested against this closed form. For gravitons the linearised Weyl tensor obeys the massless
        spin-2 equation, also conformally invariant on this conformally flat background (Penrose 1965); what is not
        established here is that the Bunch–Davies graviton state, restricted to the Weyl tensor, is the conformal image of
        the Minkowski vacuum (the metric perturbation itself is not conformally coupled), so the de Sitter graviton rate
        carries the note <code>thermal-form-assumed</code>. The Rindler graviton spectrum needs no such step: the Minkowski
        vacuum is boost invariant, and the spin-2 field strength&apos;s csch⁶ correlator transforms into the density of states{" "}
        <Formula tex="(\omega^2 + \alpha^2)(\omega^2 + 4\alpha^2)" />.
      </p>
      <p className="mt-2 text-sm text-ink-soft">
        Charge convention wherever an exact rate meets the published Schwarzschild estimate: the estimate&apos;s Planck-unit{" "}
        <Formula tex="q^2" /> is read in Heaviside–Lorentz units, <Formula tex="q^2 \to q^2/(\varepsilon_0\hbar c)" />; read in
        Gaussian units, <Formula tex="q^2/(4\pi\varepsilon_0\hbar c)" />, the estimate is 4π smaller and the ratio of the exact
        rate to it 4π larger.
      </p>
    </section>
  );
}

type EchoParams = { from?: string | string[]; label?: string | string[]; value?: string | string[]; inputs?: string | string[] };

const one = (value: string | string[] | undefined) => (typeof value === "string" ? value.slice(0, 300) : null);

/** The number a reader clicked in the editor, echoed with its inputs above the formulas, and a link to its formula. */
function ClickedNumber({ params }: { params: EchoParams }) {
  const [from, label, value, inputs] = [one(params.from), one(params.label), one(params.value), one(params.inputs)];
  if (!from || !label || !value || !(from in sources)) return null;
  return (
    <section className="mt-6 rounded border border-focus bg-white/60 p-4 text-sm" aria-label="The number you opened" data-testid="methods-echo">
      <p>
        <span className="font-semibold">{label}</span> = <span className="tabular">{value}</span>
      </p>
      {inputs && <p className="mt-1 text-ink-soft">from {inputs}</p>}
      <p className="mt-1">
        <a href={`#${from}`} className="underline decoration-rule-strong underline-offset-2">
          Its formula: {sources[from as SourceKey].title}
        </a>
      </p>
    </section>
  );
}

export default async function MethodsPage({ searchParams }: { searchParams: Promise<EchoParams> }) {
  const params = await searchParams;
  const listed = new Set(groups.flatMap((g) => g.keys));
  const rest = (Object.keys(sources) as SourceKey[]).filter((k) => !listed.has(k));
  const all = rest.length ? [...groups, { id: "further", title: "Further formulas", intro: "", keys: rest }] : groups;
  return (
    <div className="mx-auto max-w-3xl">
      <h1 className="font-serif text-4xl font-semibold tracking-tight">Methods</h1>
      <p className="mt-4 leading-relaxed text-ink-soft">
        Every number Branchline reports links to its formula here: what it computes, what it assumes, where it fails,
        and the published work it comes from. SI units throughout; <Formula tex="d" /> is the full separation of the two
        branches and <Formula tex="\Delta p(\tau) = q\,(x_A(\tau) - x_B(\tau))" /> the dipole difference along the lab's
        proper time <Formula tex="\tau" />.
      </p>
      <ClickedNumber params={params} />
      <section className="mt-6 rounded border border-rule bg-white/50 p-5">
        <h2 className="font-serif text-lg font-semibold">The core formula</h2>
        <p className="mt-2 text-sm leading-relaxed">
          For a dipole coupling <Formula tex="-\Delta p\cdot E" /> along the lab's worldline, the expected number of
          entangling quanta in the field state sourced by the difference of the branches is
        </p>
        <Formula
          display
          tex="\langle N\rangle = \frac{1}{\hbar^2}\int d\tau\,d\tau'\,\Delta p_i(\tau)\Delta p_j(\tau')\langle E_i(\tau)E_j(\tau')\rangle = \frac{1}{\hbar^2}\int\frac{d\omega}{2\pi}\,\Delta\tilde p_i^*(\omega)\Delta\tilde p_j(\omega)\,S_{ij}(\omega)"
        />
        <p className="text-sm leading-relaxed">
          with <Formula tex="S_{ij}(\omega) = \int d\tau\,e^{i\omega\tau}\langle E_i(\tau)E_j(0)\rangle" /> the one-sided
          (Wightman) spectrum of the field along the worldline, which is what the code evaluates; its even part, the
          symmetrised spectrum, gives the same <Formula tex="\langle N\rangle" /> because <Formula tex="|\Delta\tilde p(\omega)|^2" /> is
          even in <Formula tex="\omega" />. A long hold at
          constant <Formula tex="\Delta p" /> gives <Formula tex="\langle N\rangle \approx |\Delta p|^2 S(0)\,\tau_{\rm hold}/\hbar^2" />:
          the steady decoherence rate is set by the zero-frequency noise, which a horizon supplies. The overlap of the
          two field states is <Formula tex="|\langle\psi_A|\psi_B\rangle| = e^{-\langle N\rangle/2}" />; the decoherence
          time is the hold at which the hold-driven count reaches one quantum (an order-of-magnitude convention).
        </p>
        <p className="mt-2 text-sm text-ink-soft">
          Sources: arXiv:2407.02567; Wilson-Gerow, Dugad &amp; Chen, PRD 110 (2024), arXiv:2405.00804; Gralla &amp; Wei,
          arXiv:2311.11461.
        </p>
      </section>
      <aside className="mt-6 flex gap-3 rounded border border-caution-line bg-caution-bg p-4 text-sm text-caution" role="note">
        <span aria-hidden="true">⚠</span>
        <p>
          These are theoretical estimates under the assumptions listed with each formula; validity flags on every result
          say where a scenario stretches them. Laboratory work follows its institution&apos;s safety rules, not these numbers.
        </p>
      </aside>
      <DeSitterDerivation />
      {all.map((group) => (
        <section key={group.id} id={group.id} className="mt-12 scroll-mt-20">
          <h2 className="font-serif text-2xl font-semibold">{group.title}</h2>
          {group.intro && <p className="mt-2 leading-relaxed text-ink-soft">{group.intro}</p>}
          {"more" in group && group.more && (
            <p className="mt-3">
              <Link href={group.more.href} className="text-branchB underline-offset-2 hover:underline">
                {group.more.label} →
              </Link>
            </p>
          )}
          <div className="mt-4">
            {group.keys.map((key) => (
              <SourceEntryCard key={key} id={key} entry={sources[key]} />
            ))}
          </div>
        </section>
      ))}
    </div>
  );
}
