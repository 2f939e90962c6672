/* elements.c - the periodic table as phlox needs it: symbols, standard
 * atomic weights and the entropies of the elements' reference states.
 *
 * Atomic weights: IUPAC CIAAW 2021 standard atomic weights (from memory of
 * the 2021 table, Prohaska et al. 2022, Pure Appl. Chem. 94, 573); for the
 * elements whose standard weight is an interval (H, Li, B, C, N, O, Mg, Si,
 * S, Cl, Ar, Br, Tl, Pb) the conventional value printed beside the interval
 * is used.  Elements without a standard atomic weight (no stable isotope
 * with a characteristic terrestrial composition) have NAN.
 *
 * Reference-state entropies at 298.15 K and 1 bar, per atom (diatomic gases
 * halved): CODATA Key Values (Cox, Wagman and Medvedev 1989) where CODATA
 * gives the element, otherwise the NBS tables (Wagman et al. 1982), all from
 * memory; only elements recalled with confidence are listed (NAN otherwise).
 * They serve the dfG = dfH - T dfS consistency check of definition files. */
#include <math.h>
#include <string.h>

#include "thermo/thermo.h"

static const char *const element_symbols[PX_ELEMENT_MAX + 1] = {
    "",   "H",  "He", "Li", "Be", "B",  "C",  "N",  "O",  "F",  "Ne", "Na", "Mg", "Al", "Si",
    "P",  "S",  "Cl", "Ar", "K",  "Ca", "Sc", "Ti", "V",  "Cr", "Mn", "Fe", "Co", "Ni", "Cu",
    "Zn", "Ga", "Ge", "As", "Se", "Br", "Kr", "Rb", "Sr", "Y",  "Zr", "Nb", "Mo", "Tc", "Ru",
    "Rh", "Pd", "Ag", "Cd", "In", "Sn", "Sb", "Te", "I",  "Xe", "Cs", "Ba", "La", "Ce", "Pr",
    "Nd", "Pm", "Sm", "Eu", "Gd", "Tb", "Dy", "Ho", "Er", "Tm", "Yb", "Lu", "Hf", "Ta", "W",
    "Re", "Os", "Ir", "Pt", "Au", "Hg", "Tl", "Pb", "Bi", "Po", "At", "Rn", "Fr", "Ra", "Ac",
    "Th", "Pa", "U",  "Np", "Pu", "Am", "Cm", "Bk", "Cf", "Es", "Fm", "Md", "No", "Lr", "Rf",
    "Db", "Sg", "Bh", "Hs", "Mt", "Ds", "Rg", "Cn", "Nh", "Fl", "Mc", "Lv", "Ts", "Og"};

/* IUPAC CIAAW 2021 (from memory), g/mol, index = Z; 0 = none. */
static const double atomic_weights[93] = {
    0,
    1.008,        4.002602,   6.94,        9.0121831,   10.81,       /* H..B */
    12.011,       14.007,     15.999,      18.998403162, 20.1797,    /* C..Ne */
    22.98976928,  24.305,     26.9815384,  28.085,      30.973761998, /* Na..P */
    32.06,        35.45,      39.95,       39.0983,     40.078,      /* S..Ca */
    44.955907,    47.867,     50.9415,     51.9961,     54.938043,   /* Sc..Mn */
    55.845,       58.933194,  58.6934,     63.546,      65.38,       /* Fe..Zn */
    69.723,       72.630,     74.921595,   78.971,      79.904,      /* Ga..Br */
    83.798,       85.4678,    87.62,       88.905838,   91.222,      /* Kr..Zr */
    92.90637,     95.95,      0,           101.07,      102.90549,   /* Nb..Rh */
    106.42,       107.8682,   112.414,     114.818,     118.710,     /* Pd..Sn */
    121.760,      127.60,     126.90447,   131.293,     132.90545196, /* Sb..Cs */
    137.327,      138.90547,  140.116,     140.90766,   144.242,     /* Ba..Nd */
    0,            150.36,     151.964,     157.249,     158.925354,  /* Pm..Tb */
    162.500,      164.930329, 167.259,     168.934219,  173.045,     /* Dy..Yb */
    174.9668,     178.486,    180.94788,   183.84,      186.207,     /* Lu..Re */
    190.23,       192.217,    195.084,     196.966570,  200.592,     /* Os..Hg */
    204.38,       207.2,      208.98040,   0,           0,           /* Tl..At */
    0,            0,          0,           0,           232.0377,    /* Rn..Th */
    231.03588,    238.02891};                                        /* Pa, U */

typedef struct ref_entropy {
    int z;
    double s;          /* J/(mol K) per atom */
    const char *source;
} ref_entropy;

#define SRC_CODATA "CODATA 1989, Cox, Wagman and Medvedev (from memory)"
#define SRC_NBS "NBS 1982, Wagman et al. (from memory)"

/* Per atom: H2, N2, O2, F2, Cl2 (gases), Br2 (liquid) and I2 (crystal) are
 * the molecule's value divided by 2. */
static const ref_entropy ref_entropies[] = {
    {1, 130.680 / 2, SRC_CODATA},   /* H2(g) */
    {2, 126.153, SRC_CODATA},       /* He(g) */
    {3, 29.12, SRC_CODATA},         /* Li(cr) */
    {4, 9.50, SRC_CODATA},          /* Be(cr) */
    {5, 5.90, SRC_CODATA},          /* B(cr, beta) */
    {6, 5.74, SRC_CODATA},          /* C(graphite) */
    {7, 191.609 / 2, SRC_CODATA},   /* N2(g) */
    {8, 205.152 / 2, SRC_CODATA},   /* O2(g) */
    {9, 202.791 / 2, SRC_CODATA},   /* F2(g) */
    {10, 146.328, SRC_CODATA},      /* Ne(g) */
    {11, 51.30, SRC_CODATA},        /* Na(cr) */
    {12, 32.67, SRC_CODATA},        /* Mg(cr) */
    {13, 28.30, SRC_CODATA},        /* Al(cr) */
    {14, 18.81, SRC_CODATA},        /* Si(cr) */
    {15, 41.09, SRC_CODATA},        /* P(cr, white) */
    {16, 32.054, SRC_CODATA},       /* S(cr, rhombic) */
    {17, 223.081 / 2, SRC_CODATA},  /* Cl2(g) */
    {18, 154.846, SRC_CODATA},      /* Ar(g) */
    {19, 64.68, SRC_CODATA},        /* K(cr) */
    {20, 41.59, SRC_CODATA},        /* Ca(cr) */
    {22, 30.72, SRC_CODATA},        /* Ti(cr) */
    {23, 28.91, SRC_NBS},           /* V(cr) */
    {24, 23.77, SRC_NBS},           /* Cr(cr) */
    {25, 32.01, SRC_NBS},           /* Mn(cr, alpha) */
    {26, 27.28, SRC_NBS},           /* Fe(cr, alpha) */
    {27, 30.04, SRC_NBS},           /* Co(cr) */
    {28, 29.87, SRC_NBS},           /* Ni(cr) */
    {29, 33.15, SRC_CODATA},        /* Cu(cr) */
    {30, 41.63, SRC_CODATA},        /* Zn(cr) */
    {32, 31.09, SRC_CODATA},        /* Ge(cr) */
    {35, 152.21 / 2, SRC_CODATA},   /* Br2(l) */
    {36, 164.085, SRC_CODATA},      /* Kr(g) */
    {37, 76.78, SRC_CODATA},        /* Rb(cr) */
    {38, 55.69, SRC_CODATA},        /* Sr(cr) */
    {42, 28.66, SRC_NBS},           /* Mo(cr) */
    {47, 42.55, SRC_CODATA},        /* Ag(cr) */
    {48, 51.80, SRC_CODATA},        /* Cd(cr) */
    {50, 51.18, SRC_CODATA},        /* Sn(cr, white) */
    {53, 116.14 / 2, SRC_CODATA},   /* I2(cr) */
    {54, 169.685, SRC_CODATA},      /* Xe(g) */
    {55, 85.23, SRC_CODATA},        /* Cs(cr) */
    {56, 62.8, SRC_NBS},            /* Ba(cr) */
    {74, 32.64, SRC_NBS},           /* W(cr) */
    {79, 47.40, SRC_NBS},           /* Au(cr) */
    {80, 75.90, SRC_CODATA},        /* Hg(l) */
    {82, 64.80, SRC_CODATA},        /* Pb(cr) */
    {90, 51.8, SRC_CODATA},         /* Th(cr) */
    {92, 50.20, SRC_CODATA},        /* U(cr) */
};

int px_element_z(const char *symbol)
{
    if (!symbol)
        return 0;
    for (int z = 1; z <= PX_ELEMENT_MAX; z++)
        if (strcmp(element_symbols[z], symbol) == 0)
            return z;
    return 0;
}

const char *px_element_symbol(int z)
{
    if (z < 1 || z > PX_ELEMENT_MAX)
        return NULL;
    return element_symbols[z];
}

double px_element_atomic_weight(int z)
{
    if (z < 1 || z > 92 || atomic_weights[z] == 0)
        return NAN;
    return atomic_weights[z];
}

static const ref_entropy *find_entropy(int z)
{
    for (size_t i = 0; i < sizeof ref_entropies / sizeof ref_entropies[0]; i++)
        if (ref_entropies[i].z == z)
            return &ref_entropies[i];
    return NULL;
}

double px_element_ref_entropy_per_atom(int z)
{
    const ref_entropy *e = find_entropy(z);
    return e ? e->s : NAN;
}

const char *px_element_ref_entropy_source(int z)
{
    const ref_entropy *e = find_entropy(z);
    return e ? e->source : NULL;
}

double px_formula_molar_mass(const px_formula *f)
{
    if (!f)
        return NAN;
    double m = 0;
    for (int i = 0; i < f->n_elem; i++)
        m += f->elem[i].n * px_element_atomic_weight(f->elem[i].z);
    return m;
}

double px_formula_count(const px_formula *f, int z)
{
    if (!f)
        return 0;
    for (int i = 0; i < f->n_elem; i++)
        if (f->elem[i].z == z)
            return f->elem[i].n;
    return 0;
}

double px_formula_entropy_of_formation(const px_formula *f, double S)
{
    if (!f || !isfinite(S))
        return NAN;
    double s = S;
    for (int i = 0; i < f->n_elem; i++)
        s -= f->elem[i].n * px_element_ref_entropy_per_atom(f->elem[i].z);
    /* conventional ionic scale: Z H^+ -> Z/2 H2(g), S(H^+) = 0 */
    s += f->charge * px_element_ref_entropy_per_atom(1);
    return s;
}
