/* water.c - water stability lines, neutral pH and reference electrodes.
 *
 * The two lines bounding the stability of water on an E-pH map come from
 * the Nernst equation for O2(g) + 4 H+ + 4 e- = 2 H2O(l) and
 * 2 H+ + 2 e- = H2(g) (water activity 1).  The caller passes E0 of the
 * O2/H2O couple at T (from thermo; 1.229 V at 25 C, CRC Handbook
 * electrochemical series) and the slope RT ln10 / F at T, so the lines follow
 * temperature exactly as the rest of the map does.  Potentials are on the
 * standard hydrogen electrode scale; the reference-electrode table converts
 * a field measurement to that scale at 25 C, and with its temperature
 * coefficients between 0 and 60 C. */
#include "diagram/diagram.h"
#include "diagram/potential.h"
#include "core/constants.h"
#include "core/status.h"
#include <math.h>

/* Nernst slope RT ln10 / F (Nernst 1889), CODATA 2018 R and F. */
double px_diagram_nernst_slope(double T_K)
{
    return PX_R * T_K * PX_LN10 / PX_F;
}

/* Nernst for O2 + 4 H+ + 4 e- = 2 H2O: E = E0 + (s/4) log(fO2 aH+^4) */
double px_diagram_water_o2_line(double pH, double E0_V, double slope_V, double log_fO2)
{
    return E0_V - slope_V * pH + 0.25 * slope_V * log_fO2;
}

/* Nernst for 2 H+ + 2 e- = H2: E = 0 + (s/2) log(aH+^2 / fH2) */
double px_diagram_water_h2_line(double pH, double slope_V, double log_fH2)
{
    return -slope_V * pH - 0.5 * slope_V * log_fH2;
}

/* aH+ = aOH- at neutrality, so pH = pKw / 2 (water activity 1). */
double px_diagram_neutral_ph(double pKw)
{
    return 0.5 * pKw;
}

/* Offsets at 25 C and isothermal temperature coefficients (the electrode at
 * the temperature of the test).  Ranges: where the coefficients were
 * measured or the electrode is used; above about 60 C the calomel electrode
 * is not used (Hg2Cl2 disproportionates) and the saturated electrodes'
 * coefficients were not recalled beyond that (common practice, no source
 * for the limits). */
#define T_25C 298.15
#define T_0C 273.15
#define T_60C 333.15
#define SAWYER "from memory of Sawyer, Sobkowiak and Roberts, Electrochemistry for Chemists, 2nd ed. (1995), " \
               "table of reference electrode potentials and their temperature coefficients"
static const px_diagram_electrode_info electrodes[PX_ELECTRODE_COUNT] = {
    {"standard hydrogen electrode", 0.0, 0.0, 0.0, INFINITY,
     "definition (IUPAC convention: E of H+/H2 is zero at every temperature)",
     "definition (zero at every temperature)"},
    {"saturated calomel (Hg/Hg2Cl2, saturated KCl)", 0.241, -6.61e-4, T_0C, T_60C,
     "from memory of Bard and Faulkner, Electrochemical Methods, 2nd ed. (2001), "
     "table of reference electrode potentials (0.2412 V)",
     "from memory of Ives and Janz, Reference Electrodes (1961): E = 0.2412 - 6.61e-4 (t - 25) V, "
     "the quadratic term (-1.75e-6 (t - 25)^2) left out (< 2 mV to 60 C)"},
    {"Ag/AgCl, saturated KCl", 0.197, -1.01e-3, T_0C, T_60C,
     "from memory of Bard and Faulkner, Electrochemical Methods, 2nd ed. (2001), "
     "table of reference electrode potentials",
     SAWYER " (-1.01 mV/K)"},
    {"Ag/AgCl, 3.5 mol/L KCl", 0.205, -7.3e-4, T_0C, T_60C,
     "from memory of Sawyer, Sobkowiak and Roberts, Electrochemistry for Chemists, "
     "2nd ed. (1995), table of reference electrodes; medium confidence",
     SAWYER " (-0.73 mV/K); medium confidence"},
    {"Cu/CuSO4, saturated", 0.316, 9.0e-4, T_0C, T_60C,
     "from memory of Jones, Principles and Prevention of Corrosion, 2nd ed. (1996), "
     "table of reference electrodes; other corrosion texts print 0.318 V",
     "from memory of Peabody, Control of Pipeline Corrosion, 2nd ed. (2001): about +0.5 mV per "
     "degree F (+0.9 mV/K); medium confidence"},
};

const px_diagram_electrode_info *px_diagram_electrode_get(int electrode)
{
    if (electrode < 0 || electrode >= PX_ELECTRODE_COUNT) return NULL;
    return &electrodes[electrode];
}

int px_diagram_electrode_to_she(int electrode, double e_ref_V, double *e_she_V)
{
    const px_diagram_electrode_info *e = px_diagram_electrode_get(electrode);
    if (!e || !e_she_V || !isfinite(e_ref_V)) return PX_EINVAL;
    *e_she_V = e_ref_V + e->offset_V;
    return PX_OK;
}

int px_diagram_electrode_from_she(int electrode, double e_she_V, double *e_ref_V)
{
    const px_diagram_electrode_info *e = px_diagram_electrode_get(electrode);
    if (!e || !e_ref_V || !isfinite(e_she_V)) return PX_EINVAL;
    *e_ref_V = e_she_V - e->offset_V;
    return PX_OK;
}

int px_diagram_electrode_offset_at(int electrode, double T, double *offset_V)
{
    const px_diagram_electrode_info *e = px_diagram_electrode_get(electrode);
    if (!e || !offset_V || !isfinite(T)) return PX_EINVAL;
    if (fabs(T - T_25C) < 0.5) { /* the tabulated value */
        *offset_V = e->offset_V;
        return PX_OK;
    }
    if (!isfinite(e->dEdT_V_K) || T < e->T_min || T > e->T_max) return PX_ERANGE;
    *offset_V = e->offset_V + e->dEdT_V_K * (T - T_25C);
    return PX_OK;
}
