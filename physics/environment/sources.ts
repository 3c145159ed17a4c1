/**
 * The Methods entries of the environmental channels, merged into physics/estimators/sources.ts. The derivations
 * are on /methods/environment (docs/methods/environment.md).
 */
import type { SourceEntry } from "../estimators/source-entry";

const countConvention = "Branchline's ⟨N⟩ with |⟨ψ_A|ψ_B⟩| = e^{−⟨N⟩/2}: the literature's coherence e^{−Ft} gives ⟨N⟩ = 2∫F dt, the ramps' partial separation included";

export const environmentSources = {
  "environment-gas": {
    title: "Residual gas: collisions that resolve the path (long-wavelength Λ, saturated γ, joined)",
    citation:
      "E. Joos & H. D. Zeh, Z. Phys. B 59, 223 (1985); M. R. Gallis & G. N. Fleming, PRA 42, 38 (1990); K. Hornberger & J. E. Sipe, PRA 68, 012105 (2003); " +
      "M. Schlosshauer, Decoherence and the Quantum-to-Classical Transition (Springer 2007), ch. 3; O. Romero-Isart, PRA 84, 052121 (2011). Derivation at /methods/environment",
    formula:
      "F(\\Delta x) = n\\pi R^2\\big\\langle v\\,(1 - \\mathrm{sinc}^2(mv\\Delta x/\\hbar))\\big\\rangle \\to \\begin{cases}\\Lambda\\Delta x^2,& \\Lambda = \\frac{8}{3\\hbar^2}P\\sqrt{2\\pi m k_BT}\\,R^2\\\\ \\gamma = PR^2\\sqrt{8\\pi/(mk_BT)} \\end{cases},\\ \\langle N\\rangle = 2\\int F\\,dt",
    assumptions: [
      countConvention,
      "ideal gas in equilibrium; body at rest and much heavier than a molecule; hard-sphere (isotropic) scattering with the geometric cross-section πR²",
      "crossover at Δx_c = (√3/2) ħ/√(m k_B T) ≈ 0.345 λ_th; long-wavelength below Δx_c/√10, saturated above √10 Δx_c",
    ],
    failureModes: ["bodies below ~10 nm: the van der Waals cross-section dominates (flagged)", "real surfaces accommodate molecules: the crossover's shape, not its limits, changes"],
  },
  "environment-thermal-scattering": {
    title: "Thermal radiation: scattering of the surroundings' black-body photons (Rayleigh)",
    citation: "E. Joos & H. D. Zeh, Z. Phys. B 59, 223 (1985); M. Schlosshauer (2007) ch. 3; O. Romero-Isart, PRA 84, 052121 (2011). Derivation at /methods/environment",
    formula:
      "\\Lambda_{\\rm sc} = \\frac{8!\\,8\\zeta(9)\\,cR^6}{9\\pi}\\Big(\\frac{k_BT}{\\hbar c}\\Big)^9|\\chi|^2,\\ \\gamma_{\\rm sc} = \\frac{1920\\zeta(7)}{\\pi}cR^6\\Big(\\frac{k_BT}{\\hbar c}\\Big)^7|\\chi|^2,\\ \\chi = \\frac{\\varepsilon-1}{\\varepsilon+2}",
    assumptions: [countConvention, "R ≪ ħc/k_BT (flagged)", "one ε for the thermal band", "joined by ∫n σ_sc (1 − sinc²(kΔx)) c dk"],
    failureModes: ["bodies comparable with the thermal wavelength scatter geometrically: the rate is overestimated (flagged invalid)"],
  },
  "environment-thermal-absorption": {
    title: "Thermal radiation: absorption of the surroundings' photons",
    citation: "O. Romero-Isart, PRA 84, 052121 (2011); the saturated rate derived at /methods/environment",
    formula: "\\Lambda_{\\rm abs} = \\frac{16\\pi^5cR^3}{189}\\Big(\\frac{k_BT}{\\hbar c}\\Big)^6{\\rm Im}\\,\\chi,\\ \\gamma_{\\rm abs} = \\frac{4\\pi^3}{15}cR^3\\Big(\\frac{k_BT}{\\hbar c}\\Big)^4{\\rm Im}\\,\\chi",
    assumptions: [countConvention, "R ≪ ħc/k_BT", "joined by ∫n σ_abs (1 − sinc(kΔx)) c dk"],
    failureModes: ["lossless materials (Im ε = 0) give exactly zero; real materials have absorption bands"],
  },
  "environment-thermal-emission": {
    title: "Thermal radiation: emission at the body's internal temperature",
    citation: "O. Romero-Isart, PRA 84, 052121 (2011); L. Hackermüller et al., Nature 427, 711 (2004) for the measured effect on molecules",
    formula: "\\Lambda_{\\rm em} = \\frac{16\\pi^5cR^3}{189}\\Big(\\frac{k_BT_{\\rm int}}{\\hbar c}\\Big)^6{\\rm Im}\\,\\chi,\\ \\gamma_{\\rm em} = \\frac{4\\pi^3}{15}cR^3\\Big(\\frac{k_BT_{\\rm int}}{\\hbar c}\\Big)^4{\\rm Im}\\,\\chi",
    assumptions: [countConvention, "spontaneous emission into empty space (Kirchhoff: the absorption formula at T_int)", "the internal temperature stays constant"],
    failureModes: ["a body heated by a trapping laser may be far hotter than its surroundings: set T_int"],
  },
  "environment-surface": {
    title: "A warm surface: the image response of an Ohmic half-space through the fluctuation–dissipation theorem",
    citation:
      "J. R. Anglin, J. P. Paz & W. H. Zurek, PRA 55, 4041 (1997), quant-ph/9611049; S. Scheel & S. Y. Buhmann, PRA 85, 030101 (2012); " +
      "P. Kerker et al., New J. Phys. 22, 063039 (2020) (where the quasi-static model fails). Derived, and checked against a Fresnel-coefficient integral, at /methods/environment",
    formula:
      "\\frac{d\\langle N\\rangle}{dt} = \\frac{S(0)}{\\hbar^2} = \\frac{k_BT\\,q^2\\rho}{\\pi\\hbar^2}\\Big[\\frac{1}{2z_A} + \\frac{1}{2z_B} - \\frac{2}{\\sqrt{\\Delta_\\parallel^2 + (z_A+z_B)^2}}\\Big] \\to \\frac{k_BT q^2\\rho\\,\\Delta x^2}{8\\pi\\hbar^2z^3}\\ (\\parallel),\\ \\frac{k_BT q^2\\rho\\,\\Delta x^2}{4\\pi\\hbar^2z^3}\\ (\\perp)",
    assumptions: [
      "quasi-static image of a point charge: z ≪ skin depth at the protocol's frequencies, frequencies below the relaxation rate (both flagged)",
      "exact in Δx/z; the body's radius ≪ its height (flagged)",
      "Ohmic (Drude) conductor at temperature T; S(0) = 2k_BT lim Im χ/ω with Im r/ω → 2ε₀ρ",
    ],
    failureModes: ["fast charges: retardation and eddy currents (flagged; Kerker et al. 2020)", "neutral bodies: induced-dipole coupling not counted"],
  },
  "environment-budget-total": {
    title: "The whole budget: the body's own field channels and the lab's environment together",
    citation: "independent environments: the overlaps multiply, the counts add (as combined-channels)",
    formula: "\\langle N\\rangle = \\langle N\\rangle_{\\rm EM} + \\langle N\\rangle_{\\rm GW} + \\sum_{\\rm env}\\langle N\\rangle_{\\rm env},\\quad T_D = 1\\big/\\textstyle\\sum\\Gamma",
    assumptions: ["no correlation between the channels' environments", "the decoherence time sums every channel's rate at full separation"],
    failureModes: ["the dominant channel is the one with the largest ⟨N⟩ over the protocol, not necessarily the largest rate"],
  },
  "environment-margin": {
    title: "The margin: where an environmental channel would equal the body's own field channels",
    citation: "Brent's method, R. P. Brent, Algorithms for Minimization without Derivatives (1973) ch. 4; Numerical Recipes 3rd ed. §9.3",
    formula: "\\langle N\\rangle_{\\rm env}(p^*) = \\langle N\\rangle_{\\infty} + \\langle N\\rangle_{H}",
    assumptions: ["all other inputs held fixed", "searched between today's value and a limit no lab passes (10⁻²⁰ Pa, 1 mK, 1 m)"],
    failureModes: ["'not reachable' where even the limit stays above; 'already below' where the channel is already smaller"],
  },
} satisfies Record<string, SourceEntry>;
