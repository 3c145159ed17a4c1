/**
 * Where every reported number comes from: one entry per formula, keyed by the `sourceKey` each Quantity carries.
 * The /methods page renders this table; keep each entry's formula the one the code evaluates.
 */

import { environmentSources } from "../environment/sources";
import type { SourceEntry } from "./source-entry";

export type { SourceEntry };

const farFieldAssumptions = [
  "dipole (resp. quadrupole) approximation: separation much smaller than c times the ramp time",
  "slow motion: branch speeds much below c",
  "the field starts and ends in its vacuum; only the difference of the branches' sources counts",
];

const thermalAssumptions = [
  "the lab is static and the field is in the state regular on the horizon (Minkowski vacuum for Rindler, Bunch–Davies for de Sitter)",
  "separation much smaller than the distance to the horizon, so the field is sampled on one worldline",
  "each quantum is counted once: those crossing the horizon are the same as those reaching infinity",
];

const entries = {
  "far-field-em": {
    title: "Photons radiated to null infinity by the dipole difference (Larmor's formula counted in quanta)",
    citation:
      "J. D. Jackson, Classical Electrodynamics, 3rd ed., §9.2 and §14.2 (Larmor power); spontaneous-emission normalisation A = ω³|d|²/(3πε₀ħc³); " +
      "D. L. Danielson, G. Satishchandran, R. M. Wald, PRD 105, 086001 (2022), arXiv:2112.10798; A. Belenchia et al., PRD 98, 126009 (2018)",
    formula: "\\langle N\\rangle_\\infty = \\frac{1}{6\\pi^2\\varepsilon_0\\hbar c^3}\\int_0^\\infty \\omega^3\\,|\\Delta\\tilde p(\\omega)|^2\\,d\\omega,\\quad \\Delta p = q\\,(x_A - x_B)",
    assumptions: farFieldAssumptions,
    failureModes: [
      "kinked paths (velocity jumps): the count grows like the logarithm of the bandwidth and is reported at the stated time resolution",
      "a jump of the separation (branches starting or ending apart) is not a finite protocol",
    ],
  },
  "far-field-gw": {
    title: "Gravitons radiated to null infinity by the quadrupole difference (the quadrupole formula counted in quanta)",
    citation:
      "L. D. Landau & E. M. Lifshitz, The Classical Theory of Fields, §110; P. C. Peters & J. Mathews, Phys. Rev. 131, 435 (1963); " +
      "D. L. Danielson, G. Satishchandran, R. M. Wald, PRD 105, 086001 (2022), arXiv:2112.10798",
    formula:
      "\\langle N\\rangle_\\infty = \\frac{G}{5\\pi\\hbar c^5}\\int_0^\\infty \\omega^5 \\sum_{ij}|\\Delta\\tilde I^{\\rm STF}_{ij}(\\omega)|^2 d\\omega,\\quad \\Delta I_{ij} = m_{\\rm eff}\\big[(x_0 + x_A)^2 - (x_0 + x_B)^2\\big](n_in_j - \\tfrac13\\delta_{ij})",
    assumptions: [
      ...farFieldAssumptions,
      "the lab recoils to keep the centre of mass fixed: m_eff = m M_lab/(m + M_lab) when the document gives a lab mass, m otherwise; d and x₀ are measured by the lab",
      "x₀ is the body's place before the split, from the lab's centre of mass: ΔI = m_eff(2x₀d + d²) (one branch stays), 2m_eff x₀ d (symmetric split, zero only for x₀ = 0)",
    ],
    failureModes: ["as for the electromagnetic count; octupole and higher orders are not included"],
  },
  "rindler-em": {
    title: "Uniformly accelerated lab: the spectral formula with the accelerated-observer electric-field spectrum",
    citation:
      "T. H. Boyer, PRD 21, 2137 (1980); S. Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986); " +
      "D. L. Danielson, G. Satishchandran, R. M. Wald, PRD 108, 025007 (2023), arXiv:2301.00026",
    formula:
      "\\langle N\\rangle = \\frac{1}{\\hbar^2}\\int\\frac{d\\omega}{2\\pi}|\\Delta\\tilde p|^2 S(\\omega),\\ S(\\omega) = \\frac{\\hbar\\omega(\\omega^2 + a^2/c^2)}{3\\pi\\varepsilon_0 c^3(1 - e^{-2\\pi c\\omega/a})},\\ S(0) = \\frac{\\hbar a^3}{6\\pi^2\\varepsilon_0 c^6}",
    assumptions: thermalAssumptions,
    failureModes: ["separation comparable with c²/a", "kinked paths (ramp-driven part reported at the stated resolution)"],
  },
  "rindler-gw": {
    title: "Uniformly accelerated lab, gravity: thermal spectrum with the spin-2 factor (derived)",
    citation:
      "derived: the Minkowski vacuum is boost invariant, so the tidal field's Wightman function along the uniformly accelerated worldline depends on " +
      "τ − τ' only, through the interval (2c/a)² sinh²(a(τ − τ' − iε)/2c): the csch⁶ correlator of a spin-2 field strength, whose Fourier transform is " +
      "the density of states (ω² + a²/c²)(ω² + 4a²/c²) (checked numerically in tests/unit/physics/vacuum-spectra.test.ts); as a → 0 it is the " +
      "quadrupole formula counted in quanta. Scalings: D. L. Danielson, G. Satishchandran, R. M. Wald, PRD 108, 025007 (2023), arXiv:2301.00026",
    formula:
      "\\langle N\\rangle = \\int_0^\\infty \\frac{2G}{15\\pi\\hbar c^5}\\,\\frac{(\\omega^2+\\alpha^2)(\\omega^2+4\\alpha^2)}{\\omega}\\coth\\frac{\\pi\\omega}{\\alpha}\\,|\\tilde{\\dot Q}(\\omega)|^2 d\\omega,\\ \\alpha = a/c",
    assumptions: [
      ...thermalAssumptions,
      "the count uses the one-axis quadrupole weight Σ(n_in_j − δ_ij/3)² = 2/3 with the same csch⁶ spectrum for every component, as the electric field's correlator is the same for every component (Boyer 1980); a separation along the acceleration and one across it are not distinguished",
    ],
    failureModes: ["separation comparable with c²/a", "acceleration jumps in the ramps (the count grows with the bandwidth)"],
  },
  "de-sitter-em": {
    title: "de Sitter static patch: the thermal spectrum at α = √(a² + c²H²)/c, exact at and off the centre (conformal invariance of Maxwell theory)",
    citation:
      "G. W. Gibbons & S. W. Hawking, PRD 15, 2738 (1977); H. Narnhofer, I. Peter, W. Thirring, Int. J. Mod. Phys. B 10, 1507 (1996); " +
      "S. Deser & O. Levin, CQG 14, L163 (1997); D. L. Danielson, G. Satishchandran, R. M. Wald, arXiv:2301.00026",
    formula:
      "S(\\omega)\\ \\text{as for Rindler with}\\ a \\to \\sqrt{a_{\\rm lab}^2 + c^2H^2} = 2\\pi c k_B T_{\\rm local}/\\hbar,\\quad " +
      "\\frac{d\\langle N\\rangle}{d\\tau} = \\frac{q^2d^2H^3}{6\\pi^2\\varepsilon_0\\hbar c^3\\,(1 - H^2r^2/c^2)^{3/2}}",
    assumptions: [
      ...thermalAssumptions,
      "exact at every static radius r < c/H: in the conformally flat slicing the static lab's worldline is a uniformly accelerated line of Minkowski space " +
        "(acceleration √(a² + c²H²) in the flat metric), Maxwell's equations are conformally invariant in four dimensions and the Bunch–Davies state is " +
        "the conformal vacuum, so the electric-field correlator along the lab is the Rindler one at α = √(a² + c²H²)/c, the field's conformal weight " +
        "cancelling against the lab's proper time",
    ],
    failureModes: ["separation comparable with the distance to the cosmological horizon"],
  },
  "de-sitter-gw": {
    title: "de Sitter static patch, gravity: the spin-2 thermal form at the local temperature (state identified by assumption)",
    citation:
      "as de-sitter-em and rindler-gw. Established: the linearised Weyl tensor obeys the massless spin-2 field equation, which is conformally invariant " +
      "on a conformally flat background such as de Sitter (R. Penrose, Proc. R. Soc. A 284, 159 (1965)), so the field strength maps to flat space as " +
      "Maxwell's field does. Not established here: that the graviton state (Bunch–Davies) restricted to the Weyl tensor is the conformal image of the " +
      "Minkowski vacuum — the metric perturbation itself is not conformally coupled (each polarisation obeys the minimally coupled scalar equation)",
    formula: "\\text{as rindler-gw with}\\ \\alpha = 2\\pi k_B T_{\\rm local}/\\hbar",
    assumptions: [...thermalAssumptions, "the Weyl-tensor correlator of the graviton state is the conformal image of the Minkowski vacuum's (flagged: thermal-form-assumed)"],
    failureModes: ["if the graviton state's Weyl correlator differs from the conformal image, the coefficient (not the a-, H-scaling of the field equation) changes"],
  },
  "schwarzschild-far-em": {
    title: "Black hole, lab far away: published order-of-magnitude estimate of the horizon decoherence rate",
    citation: "D. L. Danielson, G. Satishchandran, R. M. Wald, 'Black holes decohere quantum superpositions', IJMPD 31, 2241003 (2022), arXiv:2205.06279",
    formula: "\\frac{d\\langle N\\rangle}{dt} \\sim \\frac{G^3M^3q^2d^2}{\\varepsilon_0\\hbar c^6 D^6}\\quad(\\text{Planck units: } M^3q^2d^2/D^6),\\ D = \\text{areal radius of the lab}",
    assumptions: [
      "D ≫ 2GM/c²",
      "Unruh state",
      "rate per Killing time, converted to lab proper time by the redshift factor",
      "charge convention: the Planck-unit q² is read in Heaviside–Lorentz units, q² → q²/(ε₀ħc); read in Gaussian units, q² → q²/(4πε₀ħc), the estimate is 4π smaller and every ratio of the exact rate to it 4π larger",
    ],
    failureModes: ["order of magnitude only: the coefficient is not given by the source", "not valid near the horizon"],
  },
  "schwarzschild-far-gw": {
    title: "Black hole, lab far away, gravity: published order-of-magnitude estimate",
    citation: "D. L. Danielson, G. Satishchandran, R. M. Wald, IJMPD 31, 2241003 (2022), arXiv:2205.06279",
    formula: "\\frac{d\\langle N\\rangle}{dt} \\sim \\frac{G^6M^5 (\\Delta I)^2}{\\hbar c^{10}D^{10}},\\ \\Delta I = m_{\\rm eff}(2x_0d + d^2)\\ \\text{or}\\ 2m_{\\rm eff}x_0d",
    assumptions: ["D ≫ 2GM/c²", "the quadrupole difference ΔI at full separation (m_eff d² for x₀ = 0 and one branch staying)"],
    failureModes: ["order of magnitude only", "not valid near the horizon"],
  },
  "schwarzschild-near-em": {
    title: "Black hole, lab near the horizon: Rindler limit with the lab's local acceleration",
    citation: "Rindler spectrum (Boyer 1980; Takagi 1986) with a = GM/(b²√(1 − 2GM/(c²b))); arXiv:2205.06279, arXiv:2301.00026",
    formula: "\\frac{d\\langle N\\rangle}{d\\tau} = \\frac{q^2d^2 a^3}{6\\pi^2\\varepsilon_0\\hbar c^6}",
    assumptions: ["proper distance to the horizon ≪ 2GM/c²", "rate per lab proper time"],
    failureModes: ["estimate: neglects the curvature of the horizon and the field's back-scattering"],
  },
  "schwarzschild-near-gw": {
    title: "Black hole, lab near the horizon, gravity: Rindler limit (thermal spin-2 form) with the local acceleration",
    citation: "as rindler-gw with a = GM/(b²√(1 − 2GM/(c²b)))",
    formula: "\\frac{d\\langle N\\rangle}{d\\tau} = \\frac{8G}{15\\pi\\hbar c^5}\\Big(\\frac{a}{c}\\Big)^5 (m_{\\rm eff}d^2)^2",
    assumptions: ["proper distance to the horizon ≪ 2GM/c²", "assumed spin-2 thermal form"],
    failureModes: ["order of magnitude only"],
  },
  "schwarzschild-interpolated-em": {
    title: "Black hole, lab between near and far: log-linear interpolation of the two estimates",
    citation: "interpolation of schwarzschild-near-em (b ≤ 1.01·2GM/c²) and schwarzschild-far-em (b ≥ 10·2GM/c²) in ln b",
    formula: "\\log\\Gamma = (1-w)\\log\\Gamma_{\\rm near} + w\\log\\Gamma_{\\rm far},\\ w = \\ln(b/1.01r_s)/\\ln(10/1.01)",
    assumptions: ["both estimates hold at their ends"],
    failureModes: ["no physics between the ends: a marked interpolation, not a computation"],
  },
  "schwarzschild-interpolated-gw": {
    title: "Black hole, lab between near and far, gravity: log-linear interpolation of the two estimates",
    citation: "interpolation of schwarzschild-near-gw and schwarzschild-far-gw in ln b",
    formula: "\\log\\Gamma = (1-w)\\log\\Gamma_{\\rm near} + w\\log\\Gamma_{\\rm far}",
    assumptions: ["both estimates hold at their ends"],
    failureModes: ["a marked interpolation, not a computation"],
  },
  "schwarzschild-exact-em": {
    title: "Black hole: exact horizon decoherence rate of a held charge at any lab radius (horizon method; derivation at /methods/schwarzschild-exact)",
    citation:
      "static charge outside the hole: E. T. Copson, Proc. R. Soc. A 118, 184 (1928), with the correction of B. Linet, J. Phys. A 9, 1081 (1976); " +
      "R. S. Hanni & R. Ruffini, PRD 8, 3259 (1973); horizon-memory count: D. L. Danielson, G. Satishchandran, R. M. Wald, " +
      "IJMPD 31, 2241003 (2022), arXiv:2205.06279, and PRD 108, 025007 (2023), arXiv:2301.00026; Rindler limit: T. H. Boyer, PRD 21, 2137 (1980). " +
      "Derived in full at /methods/schwarzschild-exact",
    formula:
      "\\frac{d\\langle N\\rangle}{d\\tau} = \\frac{\\varepsilon_0\\kappa}{\\pi\\hbar c\\sqrt{1-2GM/c^2b}}\\oint_H|\\Delta A_A|^2dS " +
      "= \\frac{q^2d^2a^3}{6\\pi^2\\varepsilon_0\\hbar c^6}\\Big[\\cos^2\\alpha\\,\\big(1 + 3\\epsilon - \\tfrac32\\epsilon^2\\ln(1 + 2/\\epsilon)\\big) + \\sin^2\\alpha\\Big]," +
      "\\ a = \\frac{GM}{b^2\\sqrt{1-2GM/c^2b}},\\ \\epsilon = \\frac{c^2b}{GM} - 2,\\ \\kappa = \\frac{c^3}{4GM}",
    assumptions: [
      "test charge: no back-reaction on the metric; the lab is static at areal radius b and the field is in the Unruh state",
      "d is the proper separation measured by the lab, small compared with the proper distance to the horizon (leading order in d)",
      "hold long compared with GM/c³: the zero-frequency limit; α = 0 for a radial separation, π/2 for a tangential one",
      "hold-driven count Γ∫f²dτ over the lab's proper time, as in the Rindler/de Sitter split; the ramps' quanta (schwarzschild-ramps) add to it",
    ],
    failureModes: [
      "separation comparable with the distance to the horizon (flagged by the module: the rate is the leading term in d)",
      "labs within ~1e-10 GM/c² of the horizon: b − 2GM/c² loses digits in double precision (flagged)",
      "far away the rate is the far-zone law 8/(3π) (radial), 2/(3π) (tangential) × q²d²(GM/c²)³/(4πε0ħb⁶): 2/(3π²) and 1/(6π²) of the published estimate",
    ],
  },
  "schwarzschild-exact-gw-far-zone": {
    title: "Black hole, gravity: hold rate from the hole's tidal heating by the quadrupole difference, far zone only (derivation at /methods/schwarzschild-exact)",
    citation:
      "tidal heating of a Schwarzschild hole: E. Poisson, PRD 70, 084044 (2004), arXiv:gr-qc/0407050 (coefficient from memory); " +
      "H. Fang & G. Lovelace, PRD 72, 124016 (2005), arXiv:gr-qc/0505156; E. Poisson & M. Sasaki, PRD 51, 5753 (1995); " +
      "fluctuation–dissipation at the Hawking temperature and the horizon count of D. L. Danielson, G. Satishchandran, R. M. Wald, arXiv:2205.06279, arXiv:2301.00026",
    formula:
      "\\frac{d\\langle N\\rangle}{d\\tau} = \\frac{4}{45\\pi}\\,\\frac{G^4M^5\\,\\Delta\\mathcal E_{ab}\\Delta\\mathcal E^{ab}}{\\hbar c^{10}\\sqrt{1-2GM/c^2b}},\\ " +
      "\\Delta\\mathcal E_{ab} = -\\frac{G}{2}\\Delta I_{cd}\\,\\partial_a\\partial_b\\partial_c\\partial_d\\frac1R\\Big|_{R=b},\\ \\Delta I = m_{\\rm eff}d^2(\\hat n\\hat n)^{\\rm STF}" +
      "\\ \\Rightarrow\\ \\frac{96}{5\\pi}\\ (\\text{radial}),\\ \\frac{26}{5\\pi}\\ (\\text{tangential})\\times\\frac{G^6M^5(m_{\\rm eff}d^2)^2}{\\hbar c^{10}b^{10}}",
    assumptions: [
      "b ≫ GM/c²: leading order in GM/(c²b), Newtonian tidal field at the hole; relative corrections of order GM/(c²b) are not computed (their size is the measure of the flag schwarzschild-gravity-model)",
      "the lab keeps its centre of mass fixed: the branches differ in their trace-free quadrupole m_eff(2x₀d + d²) (one branch stays) or 2m_eff x₀ d (symmetric), m_eff = m M_lab/(m + M_lab)",
      "Unruh state; slow variation (hold long compared with GM/c³)",
    ],
    failureModes: [
      "no exact near-zone gravitational rate is computed: the same leading-order rate is reported at every radius (continuous in b), a caution beyond GM/(c²b) = 1 %, invalid beyond 10 %; the published estimate is only shown beside it",
      "the tidal-heating coefficient is recalled, cross-checked against two independent results, not re-derived here",
    ],
  },
  "schwarzschild-exact-vs-estimate": {
    title: "Black hole: the computed hold rate divided by the published order-of-magnitude estimate",
    citation: "ratio of schwarzschild-exact-em (or schwarzschild-exact-gw-far-zone) to the schwarzschild-far/near/interpolated estimate at the same lab; see /methods/schwarzschild-exact",
    formula:
      "\\Gamma_{\\rm exact}/\\Gamma_{\\rm estimate}\\ \\to\\ \\frac{2}{3\\pi^2}\\ (\\text{radial}),\\ \\frac{1}{6\\pi^2}\\ (\\text{tangential}),\\ " +
      "\\frac{96}{5\\pi},\\ \\frac{26}{5\\pi}\\ (\\text{gravity})\\ \\text{as}\\ b \\gg GM/c^2",
    assumptions: [
      "both rates per second of lab proper time, for the same source and separation",
      "charge convention of the estimate: Heaviside–Lorentz (q² → q²/(ε₀ħc)); in Gaussian units (q² → q²/(4πε₀ħc)) the electromagnetic ratios are 4π larger: 8/(3π) and 2/(3π)",
    ],
    failureModes: ["near the horizon the estimate is the Rindler limit, which the tangential exact rate equals and the radial one approaches as 1 + 3(b/M − 2)"],
  },
  "schwarzschild-ramps": {
    title: "Black hole: the ramps' quanta — to null infinity ℐ⁺ for slow ramps far from the hole, mostly into the horizon near it",
    citation:
      "slow ramps: the dipole at infinity of the static Copson–Linet field, q(b − 2GM/c²) (E. T. Copson, Proc. R. Soc. A 118, 184 (1928); " +
      "B. Linet, J. Phys. A 9, 1081 (1976)), with the Killing-time stretch of the profile; near the horizon: the Rindler spectrum at the lab's " +
      "acceleration (T. H. Boyer, PRD 21, 2137 (1980); S. Takagi, Prog. Theor. Phys. Suppl. 88, 1 (1986)); physics/estimators/schwarzschild-ramps.ts",
    formula:
      "N_{\\rm slow}(\\mathscr I^+) = \\beta^2 f\\,N_{\\rm flat},\\ f = 1 - \\frac{2GM}{c^2b},\\ \\beta^2 = f\\ (\\text{radial}),\\ f^2\\ (\\text{tangential});\\ " +
      "N_{\\rm near} = N_{\\rm Rindler}(a);\\ \\log N = w\\log N_{\\rm slow} + (1-w)\\log N_{\\rm near},\\ w = \\frac{h^2}{1+h^2}\\frac{s^2}{1+s^2},\\ " +
      "h = \\frac{c^2b}{2GM} - 1,\\ s = \\frac{c\\,\\tau_{\\rm ramp}}{\\sqrt f\\, b}",
    assumptions: [
      "slow-ramp limit: ramps long against b/c (and so GM/c³) in Killing time; exact in GM/(c²b) for photons; gravitons: the Killing-time stretch f² only, the quadrupole's matching to the hole not computed (relative corrections O(GM/(c²b)))",
      "near-horizon limit: b − 2GM/c² ≪ 2GM/c², where the geometry around the lab is Rindler's; any ramp speed",
      "fast ramps far away: the flat count, which the Rindler count at the small local acceleration equals",
    ],
    failureModes: [
      "between the limits the count is interpolated, not computed: the flag schwarzschild-ramp-model gives the weight and the factor between the limits, the size of the uncertainty",
      "no split of the ramps' quanta into those reaching ℐ⁺ and those crossing the horizon is reported",
    ],
  },
  "spectral-split": {
    title: "Split of the spectral count into hold-driven (zero-frequency noise) and ramp-driven parts",
    citation: "derived: W(ω) = W₀/ω² + W_rest(ω); see physics/spectra/channels.ts; the rate S(0)|Δp|²/ħ² as in arXiv:2407.02567 and arXiv:2405.00804",
    formula: "\\langle N\\rangle_{\\rm hold} = \\frac{S(0)}{\\hbar^2}\\int \\Delta p(t)^2 dt,\\quad \\langle N\\rangle_{\\rm ramp} = \\int_0^\\infty W_{\\rm rest}(\\omega)|\\tilde{\\dot{\\Delta p}}(\\omega)|^2d\\omega",
    assumptions: ["the two parts add exactly; the hold part includes the time spent apart during the ramps"],
    failureModes: ["none beyond those of the spectrum"],
  },
  "source-strength-em": {
    title: "Dipole difference scale q·d",
    citation: "definition",
    formula: "A = |q|\\,d_0",
    assumptions: ["point charge; the lab is neutral"],
    failureModes: [],
  },
  "source-strength-gw": {
    title: "Quadrupole difference scale (lab recoil included when the lab mass is given)",
    citation: "definition; two-body quadrupole about the common centre of mass, μ x² with μ = m M_lab/(m + M_lab) and x measured by the lab",
    formula:
      "A = m_{\\rm eff}\\,d_0^2\\,\\max_{\\sigma\\in[0,1]}|g(\\sigma)|,\\ g = 2\\tfrac{x_0}{d_0}\\sigma + \\sigma^2\\ \\text{(one branch stays)},\\ 2\\tfrac{x_0}{d_0}\\sigma\\ \\text{(symmetric)},\\ m_{\\rm eff} = \\frac{mM_{\\rm lab}}{m + M_{\\rm lab}}",
    assumptions: ["point mass"],
    failureModes: [],
  },
  decoherence: {
    title: "Decoherence from the expected number of entangling quanta",
    citation: "coherent-state overlap |⟨ψ_A|ψ_B⟩| = e^{−⟨N⟩/2}; arXiv:2112.10798, arXiv:2205.06279",
    formula: "\\mathcal D = 1 - e^{-\\langle N\\rangle/2}",
    assumptions: ["the field ends in coherent states sourced by each branch"],
    failureModes: [],
  },
  visibility: {
    title: "Interference visibility",
    citation: "as decoherence",
    formula: "|\\langle\\psi_A|\\psi_B\\rangle| = e^{-\\langle N\\rangle/2}",
    assumptions: [],
    failureModes: [],
  },
  "decoherence-time": {
    title: "Decoherence time: the hold at which the hold-driven count reaches one quantum",
    citation: "convention of arXiv:2205.06279 (order of magnitude)",
    formula: "T_D = 1/\\Gamma_{\\rm hold}",
    assumptions: ["the hold-driven count grows linearly with the hold"],
    failureModes: ["none where there is no horizon: reported as absent"],
  },
  "combined-channels": {
    title: "Both channels together",
    citation: "independent fields: overlaps multiply, counts add",
    formula: "\\langle N\\rangle = \\langle N\\rangle_{\\rm EM} + \\langle N\\rangle_{\\rm GW}",
    assumptions: ["no cross-correlation between electromagnetic and gravitational field states"],
    failureModes: [],
  },
  "protocol-kinematics": {
    title: "Protocol kinematics: durations, peak separation, peak branch speed",
    citation: "from the document's protocol (physics/protocols)",
    formula: "v_{\\rm peak} = \\max_t |\\dot x_{A,B}(t)|",
    assumptions: [],
    failureModes: ["a jump in the separation has no finite speed"],
  },
  "background-lab": {
    title: "The lab in its background: proper acceleration, redshift factor, local temperature, distance to the horizon",
    citation: "physics/backgrounds (Tolman, Phys. Rev. 35, 904 (1930); Unruh, PRD 14, 870 (1976); Hawking 1975; Gibbons & Hawking 1977)",
    formula: "T_{\\rm local} = T_{\\rm horizon}/\\sqrt{-g_{tt}}",
    assumptions: ["static lab"],
    failureModes: [],
  },
  ...environmentSources,
} satisfies Record<string, SourceEntry>;

export type SourceKey = keyof typeof entries;

export const sources: Readonly<Record<SourceKey, SourceEntry>> = entries;
