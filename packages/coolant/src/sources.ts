// Where each figure Heatpath computes comes from, and how far it can be trusted. The wording of
// `source` and `status` follows shared/brief/trade-facts.md so a result and its test name the same
// origin.

export interface SourceNote {
  /** Where the figure or rule comes from. */
  readonly source: string;
  /** How much weight it carries: confirmed, medium, low, common practice, memory. */
  readonly status: string;
}

export const ASHRAE_GLYCOL_TABLE: SourceNote = {
  source:
    'Source A: ASHRAE Handbook—Fundamentals, table of aqueous glycol properties (edition not verified; the same table is reproduced in the CoolProp incompressible-liquid data)',
  status: 'published handbook table',
};

export const IAPWS_IF97_SATURATION: SourceNote = {
  source:
    'IAPWS-IF97, region 4 saturation-temperature equation (backward equation T_s(p), coefficients n1..n10)',
  status: 'international standard formulation',
};

export const ASHRAE_GLYCOL_PROPERTIES: SourceNote = {
  source:
    "ASHRAE Handbook—Fundamentals, density and specific-heat tables for aqueous ethylene and propylene glycol by volume % (edition not verified; as reproduced in the CoolProp project's incompressible-liquid source data, 0–100 °C)",
  status: 'published handbook table',
};

export const IAPWS_IF97_WATER: SourceNote = {
  source: 'Water density and specific heat from IAPWS-IF97 region 1 at 0.3 MPa absolute, 0–120 °C',
  status: 'international standard formulation',
};

export const ASTM_D3306_CONCENTRATION: SourceNote = {
  source: 'ASTM D3306: concentrates are meant to be used at 40–60 vol %',
  status: 'ASTM D3306',
};

export const ENGINE_TEMPERATURE_DIFFERENCE: SourceNote = {
  source:
    'Rules of thumb of the trade: engine-out versus engine-in coolant difference around 5–6 K when flow is right',
  status: 'trade article; low–medium',
};

export const THERMOSTAT_OPENING: SourceNote = {
  source: 'Rules of thumb of the trade: thermostat opening usually 82–91 °C (180–195 °F)',
  status: 'published trade textbook site; medium',
};

export const SYSTEM_PRESSURE_TEST: SourceNote = {
  source:
    'Rules of thumb of the trade: hold the system at the cap rating for 10–30 min; the gauge should not fall',
  status: 'common practice, no numeric allowable drop published',
};

export const CAP_RATING_TYPICAL: SourceNote = {
  source:
    'Rules of thumb of the trade: pressure cap ratings of 1.4–1.6 bar are common on modern cars, 0.9–1.2 bar on older ones (trade-facts.md lists 0.8–1.2 bar, 12–18 psi, for older practice)',
  status: 'common practice',
};

export const HEATPATH_WORKING_BAND: SourceNote = {
  source: "Heatpath's own working band, chosen around the published rule; not a published figure",
  status: 'Heatpath choice; revisit when a cited figure is found',
};
