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
      "Only the ramps radiate; a held superposition does not decohere in flat spacetime. For smooth ramps of duration T the count falls as 1/T²; a velocity jump makes it grow with the bandwidth.",
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
    title: "Schwarzschild: quanta into the horizon and to infinity",
    intro:
      "Outside a black hole the two counts are distinct and add: the ramps radiate to null infinity, and the held superposition's field change is absorbed by the horizon at a steady rate.",
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

export default function MethodsPage() {
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
          with <Formula tex="S_{ij}" /> the symmetrised noise spectrum of the field along the worldline. A long hold at
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
