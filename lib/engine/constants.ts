/**
 * Physical constants and fixed parameters of the engine, each with its source.
 * Sections belong to the engine's topics; add to your topic's section only.
 */

// ---- Time ----------------------------------------------------------------------------------
/** Seconds in a day [s]. */
export const SECONDS_PER_DAY = 86_400;
/** Days in the model year [d]; the engine uses 365-day years (common practice in permafrost models). */
export const DAYS_PER_YEAR = 365;

// ---- Water and ice (ground topic) ---------------------------------------------------------
/** Specific latent heat of fusion of water at 0 °C [J kg-1]: 333.55e3 (Osborne 1939, J. Res. Natl. Bur. Stand. 23, 643, as tabulated in handbooks; from memory). */
export const LATENT_HEAT_FUSION_J_KG = 333.55e3;
/** Density of liquid water [kg m-3]: 1000 (999.84 at 0 °C; rounded, common practice). */
export const WATER_DENSITY_KG_M3 = 1000;
/** Density of ice Ih at 0 °C [kg m-3]: 917 (Farouki 1981, CRREL Monograph 81-1; from memory). */
export const ICE_DENSITY_KG_M3 = 917;
/** Density of soil mineral particles [kg m-3]: 2650 (quartz-dominated soils; Farouki 1981; common practice). */
export const MINERAL_DENSITY_KG_M3 = 2650;
/** Density of soil organic matter [kg m-3]: 1300 (de Vries 1963, in Physics of Plant Environment, ed. van Wijk; from memory). */
export const ORGANIC_DENSITY_KG_M3 = 1300;
/** Density of air [kg m-3]: 1.25 (near 0 °C at sea level; common practice). */
export const AIR_DENSITY_KG_M3 = 1.25;
/** Specific heat of liquid water near 0 °C [J kg-1 K-1]: 4180 (Farouki 1981; from memory; 4217 at exactly 0 °C). */
export const WATER_SPECIFIC_HEAT_J_KGK = 4180;
/** Specific heat of ice near 0 °C [J kg-1 K-1]: 2090 (Farouki 1981; from memory). */
export const ICE_SPECIFIC_HEAT_J_KGK = 2090;
/** Specific heat of soil minerals [J kg-1 K-1]: 750 (Farouki 1981, range 0.71–0.85 kJ kg-1 K-1; from memory). */
export const MINERAL_SPECIFIC_HEAT_J_KGK = 750;
/** Specific heat of soil organic matter [J kg-1 K-1]: 1920 (de Vries 1963, 2.5 MJ m-3 K-1 at 1300 kg m-3; from memory). */
export const ORGANIC_SPECIFIC_HEAT_J_KGK = 1920;
/** Specific heat of air at constant pressure [J kg-1 K-1]: 1005 (common practice). */
export const AIR_SPECIFIC_HEAT_J_KGK = 1005;
/** Thermal conductivity of liquid water near 0 °C [W m-1 K-1]: 0.57 (Johansen 1975; Farouki 1981; from memory). */
export const WATER_CONDUCTIVITY_W_MK = 0.57;
/** Thermal conductivity of ice near 0 °C [W m-1 K-1]: 2.2 (Johansen 1975; Farouki 1981; from memory). */
export const ICE_CONDUCTIVITY_W_MK = 2.2;
/** Thermal conductivity of still air [W m-1 K-1]: 0.025 (Farouki 1981; from memory). */
export const AIR_CONDUCTIVITY_W_MK = 0.025;
/** Thermal conductivity of quartz [W m-1 K-1]: 7.7 (Johansen 1975; from memory). */
export const QUARTZ_CONDUCTIVITY_W_MK = 7.7;
/** Thermal conductivity of other soil minerals [W m-1 K-1]: 2.0 (Johansen 1975, for quartz fraction > 0.2; 3.0 below; from memory). */
export const OTHER_MINERAL_CONDUCTIVITY_W_MK = 2.0;
/** Thermal conductivity of soil organic matter [W m-1 K-1]: 0.25 (de Vries 1963; from memory). */
export const ORGANIC_CONDUCTIVITY_W_MK = 0.25;

// ---- Climate (climate topic) ----------------------------------------------------------------
/**
 * ERF of a doubling of CO2 [W m-2]: 3.93 (IPCC AR6 WG1 ch. 7, 7.3.2.1, assessed value; read as given
 * in the engine issue). doi:10.1017/9781009157896.009
 */
export const FORCING_2XCO2_W_M2 = 3.93;
/**
 * Scale of the logarithmic CO2 forcing law F = a ln(C/C0) [W m-2]: Myhre et al. (1998, Geophys. Res.
 * Lett. 25, doi:10.1029/98GL01908) give a = 5.35 (3.71 W m-2 per doubling); it is scaled here so a
 * doubling gives the AR6 3.93 W m-2: a = 3.93 / ln 2.
 */
export const CO2_FORCING_SCALE_W_M2 = FORCING_2XCO2_W_M2 / Math.LN2;
/** Equilibrium climate sensitivity [K]: AR6 WG1 best estimate 3 °C (SPM A.4.4; ch. 7, 7.5.5). */
export const EQUILIBRIUM_CLIMATE_SENSITIVITY_K = 3.0;
/** Transient climate response [K]: AR6 WG1 best estimate 1.8 °C (ch. 7, 7.5.5; SPM A.4.4 context). */
export const TRANSIENT_CLIMATE_RESPONSE_K = 1.8;
/**
 * Starting values of the two-layer heat capacities [W yr m-2 K-1]: upper 8.1, deep 110, CMIP6
 * multi-model means of the two-layer fits (AR6 WG1 ch. 7, Table 7.SM; as given in the engine issue,
 * from memory there). See lib/engine/two-layer-ebm.ts for how they are used.
 */
export const UPPER_LAYER_HEAT_CAPACITY_W_YR_M2_K = 8.1;
export const DEEP_LAYER_HEAT_CAPACITY_W_YR_M2_K = 110;
/**
 * Ocean heat uptake efficacy [-]: 1.28, CMIP5 multi-model mean of Geoffroy et al. 2013 (J. Climate 26,
 * doi:10.1175/JCLI-D-12-00195.1, Table 3; from memory).
 */
export const OCEAN_HEAT_UPTAKE_EFFICACY = 1.28;
/** Mass of carbon per ppm of atmospheric CO2 [PgC ppm-1]: 2.124 (Ballantyne et al. 2012, Nature 488; from memory). */
export const PGC_PER_PPM_CO2 = 2.124;
/**
 * Impulse response of atmospheric CO2 to a pulse emission (multi-model mean of Joos et al. 2013,
 * Atmos. Chem. Phys. 13, doi:10.5194/acp-13-2793-2013, Table 5, as used in AR5 WG1 ch. 8; from memory):
 * IRF(t) = a0 + sum a_i exp(-t / tau_i), t in years.
 */
export const CO2_IRF_A0 = 0.2173;
export const CO2_IRF_A: readonly number[] = [0.224, 0.2824, 0.2763];
export const CO2_IRF_TAU_YR: readonly number[] = [394.4, 36.54, 4.304];
/**
 * Soil organic carbon in the 0–3 m layer of the northern circumpolar permafrost region [PgC]:
 * 1035 ± 150 (Hugelius et al. 2014, Biogeosciences 11, doi:10.5194/bg-11-6573-2014; from memory).
 * The whole-region estimate including deeper deposits is about 1300 (1100–1500) PgC (same source).
 */
export const PERMAFROST_SOC_0_3M_PGC = 1035;
export const PERMAFROST_SOC_0_3M_UNCERTAINTY_PGC = 150;
export const PERMAFROST_SOC_TOTAL_PGC = 1300;


// ---- Ground ice and settlement (assess topic) -----------------------------------------------
/** MAGT above which permafrost is called warm [°C]: −2 (common practice in cold-regions engineering; no single published source is claimed). */
export const WARM_PERMAFROST_C = -2;
/** MAGT above which permafrost is called very warm [°C]: −1 (common practice; frozen soil loses strength and creeps faster as it nears 0 °C, Andersland & Ladanyi 2004, mechanical-properties chapter; from memory). */
export const VERY_WARM_PERMAFROST_C = -1;
/** Cumulative thaw settlement from which the screening raises moderate concern [m]: 0.10 (common practice, a screening choice of this engine). */
export const SETTLEMENT_MODERATE_M = 0.1;
/** Cumulative thaw settlement from which the screening raises higher concern [m]: 0.30 (common practice, a screening choice of this engine). */
export const SETTLEMENT_HIGH_M = 0.3;
/** Thaw strain from which ground is called ice-rich [-]: 0.10 (common practice; visible ice classes Vr/Vs and above, ASTM D4083). */
export const ICE_RICH_THAW_STRAIN = 0.1;
/** Thickness of ground below the permafrost table examined for ice-rich ground [m]: 2 (the transition zone, Shur, Hinkel & Nelson 2005, doi:10.1002/ppp.518; common practice). */
export const TRANSITION_ZONE_THICKNESS_M = 2;
/** Minimum thickness of a talik [m]: 0.2 (common practice). */
export const TALIK_MIN_THICKNESS_M = 0.2;
/** Spin-up convergence: the annual-mean profile changes by less than this per year [K]: 0.01 (common practice). */
export const SPINUP_TOLERANCE_K = 0.01;
/** Upper bound on spin-up years (after the accelerated start) [yr]: 400 (a bound of this engine). */
export const SPINUP_MAX_YEARS = 400;
