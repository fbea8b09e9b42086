/**
 * Every default the scenario schema fills in, with where each value comes from. The normalised
 * scenario that a run stores shows these values, so a user sees and can override each of them.
 */
export const SCENARIO_DEFAULTS = {
  /** Water temperature when none is given, degrees Celsius (a typical greenhouse value). */
  waterTemperatureC: 20,
  run: {
    /** Simulated time, s (six hours: several flood-and-drain cycles). */
    durationS: 6 * 3600,
    /** Spacing of the output samples, s. */
    outputIntervalS: 5,
    /** Relative tolerance of the adaptive integrator. */
    tolerance: 1e-8,
    friction: 'darcy-weisbach',
  },
  /**
   * Pipe materials: Hazen–Williams C and absolute roughness, m.
   * PVC and PE: C = 150 (Ill. Admin. Code tit. 77 pt. 906 App. A Exh. I, plastic pipe; LMNO
   * Engineering table "plastic 140–150"); roughness 1.5e-6 m (drawn tubing / plastic in Moody-chart
   * tables). Copper: C = 150 (from memory, NFPA 13 table), roughness 1.5e-6 m (drawn tubing, Moody
   * tables). Steel: C = 120 (from memory, NFPA 13 black steel), roughness 4.5e-5 m (commercial
   * steel, LMNO Engineering table).
   */
  materials: {
    pvc: { hazenWilliamsC: 150, roughnessM: 1.5e-6 },
    pe: { hazenWilliamsC: 150, roughnessM: 1.5e-6 },
    copper: { hazenWilliamsC: 150, roughnessM: 1.5e-6 },
    steel: { hazenWilliamsC: 120, roughnessM: 4.5e-5 },
  },
  material: 'pvc',
  /**
   * Inter-particle porosity of bed media (fraction of the bed volume that holds water).
   * Gravel 0.40: clean uniformly graded crushed stone (StormTech Tech Sheet #1, "Porosity of
   * structural backfill", 2012). Expanded clay 0.42: bed void fraction 0.40–0.45 (from memory).
   * Lava rock 0.45 (from memory; irregular scoria packs more loosely than rounded gravel). No media:
   * 1 (open water).
   */
  mediaPorosity: { gravel: 0.4, 'expanded-clay': 0.42, 'lava-rock': 0.45, none: 1 },
  /**
   * Minor-loss coefficients K (h = K·v²/2g) of one fitting. Elbows and tees: screwed fittings from
   * the equivalent lengths of ICC 2018 IRC Appendix A Table A.2.2 (90° elbow L/d 30 → 0.90, 45°
   * L/d 14 → 0.42, tee branch L/d 60 → 1.80; tee run L/d 20 → 0.60, from memory). Ball valve fully
   * open 0.08 (full-port ball valve L/d 3, Crane TP-410, from memory). Sharp entrance 0.5 (Crane,
   * Idelchik; Rishel, HVAC Pump Handbook 2nd ed. Table 3.7). Exit 1.0 (textbook: the outlet's
   * velocity head is lost). Bell return 1.5: the 180° turn over the standpipe rim inside a bell,
   * taken as a threaded 180° return bend (Munson-type table via LMNO Engineering; an analogy).
   */
  lossCoefficients: {
    elbow90: 0.9,
    elbow45: 0.42,
    teeRun: 0.6,
    teeBranch: 1.8,
    ballValve: 0.08,
    entrance: 0.5,
    exit: 1,
    bellReturn: 1.5,
  },
  /**
   * Orifice discharge coefficient C_d = C_c·C_v of a sharp-edged hole (weep holes, leaks, wall
   * overflows): 0.61, from 0.603–0.621 for circular orifices (Encyclopaedia Britannica 11th ed.,
   * 1911, "Hydromechanics" by W. C. Unwin, §§17–20, Hamilton Smith's table).
   */
  orificeDischargeCoefficient: 0.61,
  /**
   * Sharp-crested weir coefficient C_w in Q = C_w·L·H^1.5, m^0.5/s: 1.838 = 3.33 ft^0.5/s (USDA-SCS
   * riser practice), = (2/3)·0.62·√(2g); EPA SWMM 5 uses C_w/√(2g) = 0.414.
   */
  weirCoefficientSqrtMPerS: 1.838,
  /**
   * Priming coefficient k_p in Q_prime = k_p·√(g·D_s⁵). No published value exists for bell
   * siphons; this default is an analogy with vertical drain stacks, where the falling film closes
   * into water plugs at a fill fraction of about 1/4–1/3 (Wyly & Eaton, NBS BMS 132, 1952; Dawson &
   * Kalinske 1937). The design fill 7/24 gives about 15 L/min for a 1-inch Schedule 40 bore, i.e.
   * k_p ≈ 0.7 (range 0.55–0.9). Calibrate it from measured cycles.
   */
  primingCoefficient: 0.7,
  /** Calibration multiplier on a drain's losses (1 = as computed). */
  dischargeLossMultiplier: 1,
  /** Pump flow scale (1 = as on the datasheet; below 1 for a worn or clogged pump). */
  pumpFlowScale: 1,
  /** Number of samples of H = H0·(1 − (Q/Q0)²) stored for a pump given by max head and flow. */
  parabolaSamples: 11,
} as const;
