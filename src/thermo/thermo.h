/* thermo.h - species and reactions: the public interface of src/thermo/.
 *
 * What this module offers (DESIGN.md layer 2):
 *   - formulas in phlox notation (docs/element-files.md): element composition, charge,
 *     state, canonical text, molar mass (IUPAC CIAAW 2021 standard atomic
 *     weights) and the reference-state entropies of the elements;
 *   - reactions: "2 H^+ + 2 e- = H2(g)" parsed into signed coefficients,
 *     with an element-by-element and charge balance check;
 *   - px_db, a database that owns copies of species records (species.h);
 *   - standard-state properties G, H, S, Cp, V of every species at (T, P)
 *     by its model: revised HKF (aqueous), heat-capacity polynomial (solids,
 *     liquids, gases), reaction-defined (log K), and IAPWS-95 water;
 *   - reaction properties: dG, dH, dS, log K and E (V vs SHE at the same T
 *     and P, electrons substituted as e- = H^+ - 1/2 H2(g)).
 *
 * Units: K, bar, J/mol, J/(mol K), J/bar for volumes (1 J/bar = 10 cm3/mol).
 * G and H are apparent properties of formation (Benson-Helgeson): dfG or dfH
 * at 298.15 K, 1 bar plus the species' own change from Tr, Pr to T, P.
 * Every function returns a status from core/status.h and never prints. */
#ifndef PX_THERMO_H
#define PX_THERMO_H
#include <stddef.h>

#include "thermo/species.h"
#include "water/water.h"

/* ---------------------------------------------------------------- formulas */

/* Parse a formula (docs/element-files.md notation) into out; canonical text in out->text.
 * PX_EPARSE for malformed text, PX_ERANGE if a limit is exceeded. */
int px_formula_parse(const char *text, px_formula *out);
/* The same, with a human-readable reason in msg (may be NULL) on failure,
 * e.g. "unknown element 'Xx' at position 3 in 'Xx2O(s)'". */
int px_formula_parse_msg(const char *text, px_formula *out, char *msg, size_t msgsize);
/* g/mol with IUPAC 2021 standard atomic weights; NAN if an element has no
 * standard atomic weight (e.g. Tc, Pm, Po..Ac, Np and beyond). */
double px_formula_molar_mass(const px_formula *f);
/* 1 if any entry of list[0..n-1] (formulas as a user writes them, NULL
 * entries skipped) parses to the canonical text `canonical`. */
int px_formula_listed(const char *const *list, size_t n, const char *canonical);
/* Atoms of element z in f (0 if absent). */
double px_formula_count(const px_formula *f, int z);

int px_element_z(const char *symbol);  /* 0 if unknown */
const char *px_element_symbol(int z);  /* NULL if z outside 1..118 */
double px_element_atomic_weight(int z); /* g/mol, NAN if none */
/* S of the element's reference state per atom at 298.15 K, 1 bar, J/(mol K),
 * NAN if unknown (for the dfG = dfH - T dfS consistency check). */
double px_element_ref_entropy_per_atom(int z);
/* Source of that value ("CODATA 1989 (from memory)" or "NBS 1982 (from
 * memory)"), NULL if unknown. */
const char *px_element_ref_entropy_source(int z);
/* dfS = S - sum_i n_i S_i(ref) + Z S(H2,g)/2, J/(mol K): the entropy of
 * formation from the elements on the conventional ionic scale (the charge Z
 * is balanced with H^+ and H2(g), S(H^+) = 0), so dfG = dfH - Tr dfS holds
 * for ions too.  NAN if S or an element entropy is unknown. */
double px_formula_entropy_of_formation(const px_formula *f, double S);

/* --------------------------------------------------------------- reactions */

#define PX_REACTION_MAX 16 /* distinct species in one reaction */

typedef struct px_reaction {
    int n;
    px_formula sp[PX_REACTION_MAX];
    double nu[PX_REACTION_MAX]; /* signed: reactants < 0, products > 0 */
} px_reaction;

/* Parse "Fe^3+ + e- = Fe^2+", "2 H^+ + 2 e- = H2(g)", "0.5 O2(g) + ...",
 * "1/2 O2(g) + ...".  A species on both sides is netted.  Does not check
 * the balance (px_reaction_balance does).  msg may be NULL. */
int px_reaction_parse(const char *text, px_reaction *out, char *msg, size_t msgsize);
/* PX_OK if every element and the charge balance (|difference| <= 1e-9);
 * otherwise PX_EBALANCE and msg names each imbalance: "O: left 4, right 3;
 * charge: left 2, right 0". */
int px_reaction_balance(const px_reaction *r, char *msg, size_t msgsize);
/* Parse and check the balance in one call. */
int px_reaction_parse_balanced(const char *text, px_reaction *out, char *msg, size_t msgsize);
/* Electrons consumed (the reduction's n): -nu(e-), 0 if no electrons. */
double px_reaction_electrons(const px_reaction *r);
/* Canonical text of a reaction, "2 H^+ + 2 e- = H2(g)". */
int px_reaction_format(const px_reaction *r, char *buf, size_t bufsize);

/* ---------------------------------------------------------------- database */

typedef struct px_db px_db; /* owns copies of species records */
px_db *px_db_new(void);
void px_db_free(px_db *db); /* NULL ok */
/* Copies sp (incl. strings); the formula text is re-parsed and the record's
 * px_formula replaced by the canonical parse.  PX_EINVAL on duplicate text,
 * PX_EPARSE if the text does not parse. */
int px_db_add(px_db *db, const px_species *sp);
int px_db_replace(px_db *db, const px_species *sp); /* add or replace by text */
int px_db_remove(px_db *db, const char *formula);   /* PX_ENOTFOUND if absent */
size_t px_db_count(const px_db *db);
const px_species *px_db_get(const px_db *db, size_t i); /* NULL if out of range */
const px_species *px_db_find(const px_db *db, const char *formula); /* parses+canonicalizes */
long px_db_index(const px_db *db, const char *formula); /* -1 if absent */
/* Resolve a formula as a person writes it: the exact (canonical) formula,
 * else, for a solid written without a mineral name ("ZnO(s)", or "ZnO(cr)"
 * for a crystalline one), the database's only solid of that composition.
 * On failure msg says why and lists the candidates: "ZnO(s): 2 solids have
 * this formula: did you mean ZnO(s,a) or ZnO(s,b)?", or species of the same
 * composition in another state, or the same text in another letter case.
 * PX_ENOTFOUND (absent or ambiguous) or PX_EPARSE; index may be NULL. */
int px_db_resolve(const px_db *db, const char *name, long *index, char *msg, size_t msgsize);
/* 1 if an entry of list[0..n-1] (NULL entries skipped) resolves to index. */
int px_db_listed(const px_db *db, const char *const *list, size_t n, long index);
/* PX_OK if every entry resolves; else the first failure, msg "what: why". */
int px_db_check_list(const px_db *db, const char *what, const char *const *list, size_t n, char *msg,
                     size_t msgsize);
/* Built-ins: H2O(l) (IAPWS-95 model, NBS 1982 dfG/dfH/S) and the electron
 * e- (G(e-) = G(H2,g)/2 - G(H^+) so that H^+ + e- = 1/2 H2(g) has dG = 0 at
 * every T, P).  Other H/O species come from
 * stdlib/elements/HO.lua. */
int px_db_add_builtins(px_db *db);

/* References: the publications the records cite.  A record's source text
 * names each by key in brackets ("from memory of [NBS82] (S)"); the key's
 * full citation is kept once, in the database (stdlib/bibliography.lua for
 * the standard library, a file's own `sources` table otherwise). */
#define PX_REF_KEY_MAX 32 /* bytes of a key, with NUL */
typedef struct px_ref {
    char key[PX_REF_KEY_MAX];
    char *short_text; /* author-year form, "Wagman et al. 1982" */
    char *cite;       /* the full citation */
} px_ref;
/* Adds a reference; PX_OK also when the key is there with the same
 * citation, PX_EINVAL when it is there with another one. */
int px_db_ref_add(px_db *db, const char *key, const char *short_text, const char *cite);
const px_ref *px_db_ref_find(const px_db *db, const char *key); /* NULL if absent */
size_t px_db_ref_count(const px_db *db);
const px_ref *px_db_ref_get(const px_db *db, size_t i); /* in the order added */
/* The next "[KEY]" in text from *pos (KEY: an upper-case letter, then
 * letters, digits or '_'): 1 and the key, *pos moved past it; 0 at the end. */
int px_ref_next(const char *text, size_t *pos, char key[PX_REF_KEY_MAX]);

/* Where sp's temperature dependence comes from, derived from its fields:
 * LOGK with dH or logK_T: measured, unless its dCp is a Criss-Cobble
 * estimate or taken from an isocoulombic model reaction (estimated); LOGK with an isocoulombic estimate:
 * estimated (with or without a model reaction, logk.model); other
 * LOGK: held at 25 C; HKF with estimated = 1: estimated (SH88
 * correlations); CP with every Cp coefficient 0: no Cp; else measured.
 * *method (may be NULL) receives the method's name ("" unless estimated).
 * px_db_add stores the result in the copy's tbasis and tmethod. */
#define PX_METHOD_ISOCOULOMBIC "isocoulombic (Gu et al. 1994)"
#define PX_METHOD_HKF_SH88 "HKF correlations (Shock and Helgeson 1988)"
#define PX_METHOD_KOPP "Kopp-Neumann additivity (Kopp 1865)"
#define PX_METHOD_CRISS_COBBLE "Criss-Cobble correspondence (Criss and Cobble 1964)"
#define PX_METHOD_ISO_CP "isocoulombic heat capacity, model substance (Lindsay 1980)"
px_tbasis px_species_tbasis(const px_species *sp, const char **method);
/* "measured", "estimated", "held", "no Cp". */
const char *px_tbasis_name(px_tbasis b);

/* Initialise a record: zeros, NAN for dGf/dHf/S, logk.dH NAN, Tmin/Tmax
 * 0..INFINITY, source NULL.  For code that builds records by hand. */
void px_species_init(px_species *sp);

/* ---------------------------------------------------------- revised HKF */

/* Papers' solvent constants (Tanger and Helgeson 1988). */
#define PX_HKF_THETA 228.0   /* K */
#define PX_HKF_PSI 2600.0    /* bar */
#define PX_HKF_ETA (1.66027e5 * 4.184) /* J Angstrom/mol (S92: 1.66027e5 A cal/mol) */
#define PX_HKF_RE_H 3.082    /* Angstrom, effective Born radius of H^+ (S92) */

typedef struct px_thermo_props {
    double G;  /* apparent Gibbs energy of formation, J/mol */
    double H;  /* apparent enthalpy of formation, J/mol */
    double S;  /* J/(mol K) */
    double Cp; /* J/(mol K) */
    double V;  /* J/bar (x10 = cm3/mol) */
} px_thermo_props;

/* The S92 g-function (Angstrom) and its derivatives at the state w
 * (uses w->T, w->P, w->rho, w->drho_dT, w->drho_dP) and d2rho_dT2
 * (kg/m3/K^2; only g_TT needs it, pass 0 if unknown). */
typedef struct px_hkf_gfun {
    double g, g_T, g_P, g_TT;
} px_hkf_gfun;
void px_hkf_gfunction(const px_water_state *w, double d2rho_dT2, px_hkf_gfun *out);

/* omega(T,P) and derivatives for charge Z from omega at Tr, Pr (S92). */
typedef struct px_hkf_omega {
    double w, w_T, w_P, w_TT;
} px_hkf_omega;
void px_hkf_omega_eval(double omega_ref, int charge, const px_hkf_gfun *g, px_hkf_omega *out);

/* HKF G, H, S, Cp, V of one species at w's (T, P).  w: water at T, P;
 * wr: water at Tr, Pr (same dielectric model); d2rho_dT2 at T, P (0 if
 * unknown: then Cp misses a term of the g-function, zero below ~100 C).
 * dGf, dHf (J/mol), S (J/(mol K)) at Tr, Pr; dHf may be NAN (then H NAN). */
int px_hkf_props(const px_hkf_params *p, int charge, double dGf, double dHf, double S,
                 const px_water_state *w, const px_water_state *wr, double d2rho_dT2,
                 px_thermo_props *out);
/* G only (the fast path; no derivatives of omega needed). */
int px_hkf_G(const px_hkf_params *p, int charge, double dGf, double S,
             const px_water_state *w, const px_water_state *wr, double *G);

/* The Born constants at 25 C, 1 bar quoted in the HKF papers (SH88, TH88);
 * c1/c2 were regressed with them.  Fills eps, Q, Y, X, rho (997.06 kg/m3)
 * and T = 298.15, P = 1 of a px_water_state (other fields zero). */
void px_hkf_papers_water_25C(px_water_state *w);

/* Shock and Helgeson 1988 estimation: fills sp->hkf from sp->S, sp->f.charge,
 * Cp25 (J/(mol K), required) and V25 (cm3/mol, NAN = unknown: a1..a4 = 0).
 * omega: if sp->hkf.omega is finite and non-zero on entry it is kept (e.g.
 * from px_hkf_omega_born); otherwise omega = -1514.4 S + beta_Z (cal units)
 * for Z in -2..+2 (PX_EDATA for other charges).  Sets sp->estimated = 1. */
int px_hkf_estimate(px_species *sp, double Cp25, double V25);
/* Conventional omega (J/mol) of an ion from its crystal radius r_x (A):
 * r_e = r_x + |Z| Gamma_Z, Gamma = 0.94 A for cations, 0 for anions
 * (Helgeson and Kirkham 1976; SH88). */
double px_hkf_omega_born(int charge, double r_x);

/* ------------------------------------------------ evaluation at (T, P) */

typedef struct px_thermo_ws px_thermo_ws; /* caller-owned cache */

/* A workspace using dielectric model m for eps at T and at Tr (both the
 * same).  NULL on allocation failure.  The reference water state is
 * evaluated lazily (first use). */
px_thermo_ws *px_thermo_ws_new(px_dielectric_model m);
void px_thermo_ws_free(px_thermo_ws *ws); /* NULL ok */
/* Text of the last failure (names the species), "" if none. */
const char *px_thermo_ws_error(const px_thermo_ws *ws);
/* The water state at (T, P), evaluated once per (T, P) and cached. */
int px_thermo_ws_water(px_thermo_ws *ws, double T, double P, const px_water_state **w);

/* Apparent G of one species (J/mol).  sp need not belong to db, but LOGK
 * species resolve their reactions in db, and e- needs H2(g) in db. */
int px_thermo_species_G(px_thermo_ws *ws, const px_db *db, const px_species *sp,
                        double T, double P, double *G);
/* G, H, S, Cp, V of one species. */
int px_thermo_species_props(px_thermo_ws *ws, const px_db *db, const px_species *sp,
                            double T, double P, px_thermo_props *out);
/* G of every species of db at (T, P) into G[0 .. px_db_count(db)-1]. */
int px_thermo_eval_all(px_thermo_ws *ws, const px_db *db, double T, double P, double *G);

/* Reaction properties; E is NAN when the reaction has no electrons. */
typedef struct px_reaction_result {
    double dG, dH, dS, dCp, dV; /* J/mol, J/mol, J/(mol K), J/(mol K), J/bar */
    double logK;
    double n_e; /* electrons consumed (reduction written left to right) */
    double E;   /* V vs SHE at the same T, P: -dG/(n_e F) */
} px_reaction_result;
int px_reaction_props(px_thermo_ws *ws, const px_db *db, const px_reaction *r,
                           double T, double P, px_reaction_result *out);
/* log K only (fast path: G of each species). */
int px_reaction_logK(px_thermo_ws *ws, const px_db *db, const px_reaction *r,
                     double T, double P, double *logK);

/* ------------------------------------------- isocoulombic estimate */

/* The one-term isocoulombic extrapolation (Lindsay 1980; Gu, Gammons and
 * Bloom 1994, GCA 58, 3545; from memory, docs/thermo.md).  The reaction R is
 * combined with n times the water ionisation W: H2O(l) = H^+ + OH^- so that
 * R' = R + n W carries the same total positive (and so negative) ionic charge
 * on both sides; for R' dCp ~ 0 and dS ~ 0, so dG(R') is constant (log K(R')
 * T = const, the "one-term" equation), hence
 *   dG_R(T,P) = dG_R(Tr) + n [dG_W(Tr,Pr) - dG_W(T,P)], with dG_W from
 * phlox's own H2O(l), H^+ and OH^-.  n = -sum over charged species with z > 0
 * of nu z (products positive); an electron counts as -1 H^+ (e- = 1/2 H2(g) -
 * H^+).  PX_OK always (n is an integer for integer coefficients).
 * With a model reaction M (px_logk_params.model: a reaction of the same
 * charge type whose species have measured temperature data; Lindsay 1980;
 * Gu et al. 1994), R' = R - M + n W with n from the charges of R - M, and
 *   dG_R(T,P) = dG_R(Tr) - dG_M(Tr) + dG_M(T,P) + n [dG_W(Tr,Pr) - dG_W(T,P)],
 * dG_M from the database's own species (docs/thermo.md). */
int px_reaction_isocoulombic_n(const px_reaction *r, double *n);
/* log K at (T, P) of reaction r from its log K at 25 C by that method; needs
 * H^+, OH^- and H2O(l) in db (PX_ENOTFOUND otherwise, message in ws).  Also
 * dG_W at Tr, Pr is taken from their dfG (PX_EDATA if one is not finite). */
int px_isocoulombic_logK(px_thermo_ws *ws, const px_db *db, const px_reaction *r, double logK25,
                         double T, double P, double *logK);

/* Default pressure: P = max(1 bar, psat(T)): 1 bar up to the normal boiling
 * point (99.61 C), the saturation pressure above (the usual "1 bar to 100 C,
 * psat above" of the HKF tables, made continuous: at 100 C and 1 bar water
 * would be steam).  PX_ERANGE below 273.15 K or above 623.15 K. */
int px_thermo_default_pressure(double T, double *P);

/* Kopp's atomic heat capacity of element z in a solid, J/(mol K) (Kopp 1865,
 * Kopp's rule; docs/thermo.md): C 7.53, H 9.62, B 11.30, Si 15.90, O 16.74,
 * F 20.92, P and S 22.59, every other element 25.94 (the Dulong-Petit value
 * Kopp used); NAN for z outside 1..118. */
double px_kopp_atomic_cp(int z);
/* Kopp-Neumann additivity: the Cp polynomial of solid f as the sum of n
 * components (formulas comp[i] with amounts nu[i] > 0 and published Cp
 * polynomials comp_cp[i]) plus Kopp's atomic heat capacities for the atoms
 * f holds beyond them.  out->a..e are set (V and the estimate flag are left
 * to the caller).  PX_EDATA with a reason in msg (may be NULL) if the
 * components hold more of an element than f, or f is charged. */
int px_cp_kopp(const px_formula *f, int n, const px_formula *comp, const double *nu,
               const px_cp_params *comp_cp, px_cp_params *out, char *msg, size_t msgsize);

/* CP model alone (solids, liquids, gases), exact integrals of
 * Cp = a + bT + c/T^2 + d/sqrt(T) + eT^2 from Tr; gases have no pressure
 * term (ideal gas at 1 bar), condensed phases add V (P - Pr). */
int px_cp_props(const px_species *sp, double T, double P, px_thermo_props *out);

#endif
