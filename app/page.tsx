import Link from "next/link";

export default function LandingPage() {
  return (
    <section className="mx-auto max-w-2xl py-16">
      <h1 className="font-serif text-4xl font-semibold tracking-tight">Branchline</h1>
      <p className="mt-6 text-lg leading-relaxed text-ink-soft">
        Branchline tells you how much which-path information a charged or massive body in a spatial superposition leaks
        through its own fields: the entangling quanta radiated to infinity when the branches separate and recombine, and
        the soft quanta a black-hole, Rindler or cosmological horizon absorbs while they are held apart.
      </p>
      <p className="mt-4 text-lg leading-relaxed text-ink-soft">
        Draw the two branch worldlines on a conformal diagram, set the source and the lab in SI units, and read the
        decoherence, the decoherence time and the best recombination time, each with its unit, its published source and
        its validity flags.
      </p>
      <div className="mt-10 flex gap-4">
        <Link href="/sign-up" className="rounded bg-ink px-4 py-2 text-paper hover:bg-ink-soft">
          Create an account
        </Link>
        <Link href="/methods" className="rounded border border-rule-strong px-4 py-2 hover:border-ink">
          Read the methods
        </Link>
      </div>
    </section>
  );
}
