/* check.c - rules that need a whole element file, after its table was read.
 *
 *   - formula versus state, charge and model (hkf: aqueous; cp: solid, liquid
 *     or gas; charged species are aqueous);
 *   - membership: every species of Zn.lua contains Zn; a ligand file's
 *     species contain the ligand; a species with a ligand that comes earlier
 *     in the order Cl, S, C, N, P, F belongs in that ligand's file (warning);
 *   - duplicates within the file (and against species already known);
 *   - third-law entropies of solids, liquids and gases are positive;
 *   - the cycle dfG = dfH - T dfS at 298.15 K, with dfS from the elements'
 *     reference-state entropies; for ions the conventional scale (H+ = 0)
 *     gives each unit of positive charge the entropy of one released
 *     electron, S(e-) = S(H2, g)/2 (from H+ + e- = 1/2 H2 with S(H+) = 0);
 *     a mismatch above opt->consistency_tol is an error, and the message
 *     says which single slip (a flipped sign, a kJ/J or J/cal factor) would
 *     close the cycle; a species with `known_mismatch = "why"` gets a warning
 *     instead, up to PX_DATA_KNOWN_MISMATCH_MAX (never for gross slips);
 *   - a |dfG| or |dfH| per atom beyond opt->magnitude_warn (unit slip?);
 *   - logk reactions: parsed and balanced by thermo's px_reaction_parse and
 *     px_reaction_balance (the parser the core uses later); the species is a
 *     product with coefficient 1; reactants known (when a database is given);
 *   - HKF estimates are made here (px_hkf_estimate) once the formula, and so
 *     the charge, is known. */
#include "core/alloc.h"
#include "data/data_internal.h"
#include "core/constants.h"
#include "core/status.h"
#include <ctype.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

/* the ligand files in the order docs/element-files.md gives for mixed-ligand species:
 * Cl, S, C, N, P, F (atomic numbers) */
static const int ligand_order[] = {17, 16, 6, 7, 15, 9};
#define N_LIGANDS (sizeof ligand_order / sizeof ligand_order[0])
/* log K from logK_T at 25 C versus the given logK: warning beyond this
 * (common practice, no source: about the rounding of published fits) */
#define LOGK_AGREE_TOL 0.05

/* species H and O are built in (docs/element-files.md, "Where species go") */
static const char *const builtin_names[] = {"H2O(l)", "H^+",   "OH^-",   "O2(g)",    "O2(aq)",
                                            "H2(g)",  "H2(aq)", "H2O2(aq)", "e-", NULL};

static double count_of(const px_formula *fm, int z)
{
    for (int i = 0; i < fm->n_elem; i++)
        if (fm->elem[i].z == z) return fm->elem[i].n;
    return 0;
}

int px_data_ligand_z(size_t i)
{
    return i < N_LIGANDS ? ligand_order[i] : 0;
}

int px_data_ligand_rank(int z)
{
    for (size_t i = 0; i < N_LIGANDS; i++)
        if (ligand_order[i] == z) return (int)i;
    return -1;
}

/* "Cl, S, C, N, P, F" into buf */
static const char *ligand_order_text(char *buf, size_t size)
{
    size_t len = 0;
    buf[0] = '\0';
    for (size_t i = 0; i < N_LIGANDS && len < size; i++)
        len += (size_t)snprintf(buf + len, size - len, "%s%s", i ? ", " : "", px_element_symbol(ligand_order[i]));
    return buf;
}

static int only_h_o(const px_formula *fm)
{
    for (int i = 0; i < fm->n_elem; i++)
        if (fm->elem[i].z != 1 && fm->elem[i].z != 8) return 0;
    return 1;
}

static void check_membership(pxd_file *f, pxd_entry *e)
{
    const px_formula *fm = &e->sp.f;
    if (f->element_ho) {
        if (!only_h_o(fm))
            pxd_report_entry(f, e, PX_DATA_ERROR, "formula",
                             "the HO file holds species of H and O only");
        return;
    }
    if (!f->element_z) return;
    if (count_of(fm, f->element_z) <= 0) {
        pxd_report_entry(f, e, PX_DATA_ERROR, "formula",
                         "does not contain %s, the element of this file", f->element);
        return;
    }
    int own = px_data_ligand_rank(f->element_z);
    int first = -1;
    for (int i = 0; i < fm->n_elem; i++) {
        int r = px_data_ligand_rank(fm->elem[i].z);
        if (r >= 0 && (first < 0 || r < first)) first = r;
    }
    if (first >= 0 && (own < 0 || first < own)) {
        char order[64];
        pxd_report_entry(f, e, PX_DATA_WARNING, "formula",
                         "belongs in %s.lua (species with ligands go in the first ligand's file, "
                         "order %s)",
                         px_element_symbol(ligand_order[first]), ligand_order_text(order, sizeof order));
    }
}

/* dfG - (dfH - Tr dfS); NAN if an element has no reference entropy.
 * dfS from px_formula_entropy_of_formation (thermo): S - sum n_i S_i(ref)
 * + Z S(H2,g)/2, the conventional ionic scale. */
static double cycle_residual(const px_formula *fm, double G, double H, double S, int *missing_z)
{
    for (int i = 0; i < fm->n_elem; i++)
        if (!isfinite(px_element_ref_entropy_per_atom(fm->elem[i].z))) {
            *missing_z = fm->elem[i].z;
            return NAN;
        }
    if (fm->charge != 0 && !isfinite(px_element_ref_entropy_per_atom(1))) {
        *missing_z = 1;
        return NAN;
    }
    double dfS = px_formula_entropy_of_formation(fm, S);
    if (!isfinite(dfS)) return NAN;
    return G - (H - PX_TR * dfS);
}

typedef struct slip {
    int which; /* 0 G, 1 H, 2 S */
    double factor;
    const char *what;
} slip;

static const slip slips[] = {
    {2, -1.0, "S had the opposite sign"},
    {1, -1.0, "H had the opposite sign"},
    {0, -1.0, "G had the opposite sign"},
    {0, PX_CAL, "G were multiplied by 4.184: a cal/J or kcal/kJ mix-up?"},
    {0, 1.0 / PX_CAL, "G were divided by 4.184: a cal/J or kcal/kJ mix-up?"},
    {1, PX_CAL, "H were multiplied by 4.184: a cal/J or kcal/kJ mix-up?"},
    {1, 1.0 / PX_CAL, "H were divided by 4.184: a cal/J or kcal/kJ mix-up?"},
    {2, PX_CAL, "S were multiplied by 4.184: a cal/J mix-up?"},
    {2, 1.0 / PX_CAL, "S were divided by 4.184: a cal/J mix-up?"},
    {0, 1e3, "G were multiplied by 1000: a J/kJ mix-up?"},
    {0, 1e-3, "G were divided by 1000: a J/kJ mix-up?"},
    {1, 1e3, "H were multiplied by 1000: a J/kJ mix-up?"},
    {1, 1e-3, "H were divided by 1000: a J/kJ mix-up?"},
};

static void check_cycle(pxd_file *f, pxd_entry *e)
{
    const px_species *sp = &e->sp;
    double tol = f->opt->consistency_tol;
    if (!(e->has_G && e->has_H && e->has_S) || !(tol < INFINITY)) return;
    int missing = 0;
    double r = cycle_residual(&sp->f, sp->dGf, sp->dHf, sp->S, &missing);
    if (isnan(r)) {
        const char *sym = px_element_symbol(missing);
        pxd_report_entry(f, e, PX_DATA_WARNING, "G",
                         "dfG/dfH/S consistency not checked: no reference entropy for %s",
                         sym ? sym : "an element");
        return;
    }
    if (fabs(r) <= tol) {
        if (e->known_mismatch)
            pxd_report_entry(f, e, PX_DATA_WARNING, "known_mismatch",
                             "the cycle closes (%.2f kJ/mol): known_mismatch can go", r / PXD_KJ);
        return;
    }
    if (e->known_mismatch && fabs(r) <= PX_DATA_KNOWN_MISMATCH_MAX) {
        pxd_report_entry(f, e, PX_DATA_WARNING, "G",
                         "dfG - (dfH - T dfS) = %.2f kJ/mol, accepted as a known mismatch",
                         r / PXD_KJ);
        return;
    }
    const char *hint = NULL;
    for (size_t i = 0; i < sizeof slips / sizeof slips[0] && !hint; i++) {
        double v[3] = {sp->dGf, sp->dHf, sp->S};
        v[slips[i].which] *= slips[i].factor;
        int m2 = 0;
        double r2 = cycle_residual(&sp->f, v[0], v[1], v[2], &m2);
        if (fabs(r2) <= tol) hint = slips[i].what;
    }
    pxd_report_entry(f, e, PX_DATA_ERROR, "G",
                     "dfG = %.3f kJ/mol but dfH - T dfS = %.3f kJ/mol at 298.15 K: mismatch %.2f "
                     "kJ/mol > %.2f kJ/mol%s%s%s",
                     sp->dGf / PXD_KJ, (sp->dGf - r) / PXD_KJ, r / PXD_KJ, tol / PXD_KJ,
                     hint ? " (it closes if " : "", hint ? hint : "", hint ? ")" : "");
}

static void check_magnitude(pxd_file *f, pxd_entry *e)
{
    double lim = f->opt->magnitude_warn, atoms = 0;
    if (!(lim < INFINITY)) return;
    for (int i = 0; i < e->sp.f.n_elem; i++) atoms += e->sp.f.elem[i].n;
    if (atoms <= 0) return;
    const char *name[2] = {"G", "H"};
    double v[2] = {e->has_G ? e->sp.dGf : 0, e->has_H ? e->sp.dHf : 0};
    for (int i = 0; i < 2; i++)
        if (fabs(v[i]) / atoms > lim)
            pxd_report_entry(f, e, PX_DATA_WARNING, name[i],
                             "%.4g kJ/mol is implausibly large for %g atoms: check the energy unit",
                             v[i] / PXD_KJ, atoms);
}

/* Physical ranges: values beyond these are slips (a pasted exponent, a
 * garbled number), not data.  Each is far outside what any published value
 * reaches, and outside what a unit slip (J for kJ, cal for J: the
 * consistency check names those with a hint) makes of one (common practice,
 * no source; the largest known magnitudes are given beside each). */
#define RANGE_LOGK_MAX 500.0    /* |log K|: the most insoluble sulfides reach about 100 */
#define RANGE_G_MAX 1e12        /* |dfG|, |dfH| J/mol: large silicates reach about 1.5e7 */
#define RANGE_S_MAX 1e8         /* |S| J/(mol K): large minerals reach a few 1e3 */
#define RANGE_CP_MAX 1e5        /* |Cp(T)| J/(mol K) over the valid range: same */
#define RANGE_V_MAX 1e5         /* |V| J/bar (1e6 cm3/mol): minerals reach about 1e2 J/bar */
#define RANGE_DH_MAX 1e7        /* |dH| of a log K reaction, J/mol: about 1e6 at most */
#define RANGE_HKF_MAX 1e9       /* |HKF parameter| in SI units: omega reaches about 1e7 J/mol */
#define RANGE_T_MAX 10000.0     /* K: gas Cp tables end at 6000 K (JANAF, from memory) */

/* Cp = a + b T + c/T^2 + d/sqrt(T) + e T^2 (docs/element-files.md) */
static double cp_at(const px_cp_params *p, double T)
{
    return p->a + p->b * T + p->c / (T * T) + p->d / sqrt(T) + p->e * T * T;
}

/* log K = k0 + k1 T + k2/T + k3 log10 T + k4/T^2 (docs/element-files.md) */
static double logk_at(const double *k, double T)
{
    return k[0] + k[1] * T + k[2] / T + k[3] * log10(T) + k[4] / (T * T);
}

static void out_of_range(pxd_file *f, pxd_entry *e, const char *field, const char *what, double v,
                         double max, const char *unit)
{
    pxd_report_entry(f, e, PX_DATA_ERROR, field,
                     "%s = %g %s is outside the physical range (|value| <= %g %s): a unit or "
                     "exponent slip?", what, v, unit, max, unit);
}

static void check_ranges(pxd_file *f, pxd_entry *e)
{
    const px_species *sp = &e->sp;
    if (isfinite(sp->dGf) && fabs(sp->dGf) > RANGE_G_MAX) out_of_range(f, e, "G", "G", sp->dGf, RANGE_G_MAX, "J/mol");
    if (isfinite(sp->dHf) && fabs(sp->dHf) > RANGE_G_MAX) out_of_range(f, e, "H", "H", sp->dHf, RANGE_G_MAX, "J/mol");
    if (isfinite(sp->S) && fabs(sp->S) > RANGE_S_MAX) out_of_range(f, e, "S", "S", sp->S, RANGE_S_MAX, "J/(mol K)");
    if (sp->Tmax > RANGE_T_MAX && isfinite(sp->Tmax))
        out_of_range(f, e, "T_range", "Tmax", sp->Tmax, RANGE_T_MAX, "K");
    double T[3] = {PX_TR, sp->Tmin > 0 ? sp->Tmin : PXD_TMIN_DEFAULT,
                   isfinite(sp->Tmax) && sp->Tmax <= RANGE_T_MAX ? sp->Tmax : PXD_TMAX_DEFAULT};
    if (sp->model == PX_MODEL_CP) {
        for (int i = 0; i < 3; i++) {
            double cp = cp_at(&sp->cp, T[i]);
            if (!(fabs(cp) <= RANGE_CP_MAX)) {
                char what[40];
                snprintf(what, sizeof what, "Cp(%.2f K)", T[i]);
                out_of_range(f, e, "cp", what, cp, RANGE_CP_MAX, "J/(mol K)");
                break;
            }
        }
        if (!(fabs(sp->cp.V) <= RANGE_V_MAX)) out_of_range(f, e, "V", "V", sp->cp.V, RANGE_V_MAX, "J/bar");
    }
    if (sp->model == PX_MODEL_HKF) {
        const double *h = &sp->hkf.a1;
        static const char *const names[] = {"hkf.a1", "hkf.a2", "hkf.a3", "hkf.a4", "hkf.c1", "hkf.c2", "hkf.omega"};
        for (int i = 0; i < 7; i++)
            if (!(fabs(h[i]) <= RANGE_HKF_MAX)) {
                out_of_range(f, e, names[i], names[i], h[i], RANGE_HKF_MAX, "(SI)");
                break;
            }
    }
    if (sp->model == PX_MODEL_LOGK) {
        if (e->has_logK && !(fabs(e->logK_given) <= RANGE_LOGK_MAX))
            out_of_range(f, e, "logK", "logK", e->logK_given, RANGE_LOGK_MAX, "");
        if (isfinite(sp->logk.dH) && fabs(sp->logk.dH) > RANGE_DH_MAX)
            out_of_range(f, e, "dH", "dH", sp->logk.dH, RANGE_DH_MAX, "J/mol");
        if (e->has_logK_T)
            for (int i = 0; i < 3; i++) {
                double v = logk_at(sp->logk.k, T[i]);
                if (!(fabs(v) <= RANGE_LOGK_MAX)) {
                    char what[40];
                    snprintf(what, sizeof what, "logK_T(%.2f K)", T[i]);
                    out_of_range(f, e, "logK_T", what, v, RANGE_LOGK_MAX, "");
                    break;
                }
            }
    }
}

static int is_builtin(const char *canonical)
{
    for (int i = 0; builtin_names[i]; i++) {
        px_formula b;
        if (px_formula_parse(builtin_names[i], &b) == PX_OK && strcmp(b.text, canonical) == 0)
            return 1;
    }
    return 0;
}

static int cmp_name(const void *a, const void *b)
{
    const pxd_name *x = a, *y = b;
    int c = strcmp(x->text, y->text);
    return c ? c : (x->index > y->index) - (x->index < y->index);
}

/* the formula-ok entries sorted by (formula, position): lookups and the
 * duplicate check in O(log n) instead of a scan of the file */
static void build_names(pxd_file *f)
{
    f->names = px_alloc(NULL, (f->n ? f->n : 1) * sizeof *f->names);
    if (!f->names) {
        f->oom = 1;
        return;
    }
    for (size_t i = 0; i < f->n; i++)
        if (f->e[i].formula_ok) f->names[f->n_names++] = (pxd_name){f->e[i].sp.f.text, i};
    qsort(f->names, f->n_names, sizeof *f->names, cmp_name);
}

/* the first entry (lowest position) with this canonical formula, or NULL */
static const pxd_entry *find_in_file(const pxd_file *f, const char *canonical)
{
    size_t lo = 0, hi = f->n_names;
    while (lo < hi) {
        size_t mid = lo + (hi - lo) / 2;
        if (strcmp(f->names[mid].text, canonical) < 0) lo = mid + 1;
        else hi = mid;
    }
    if (lo < f->n_names && strcmp(f->names[lo].text, canonical) == 0) return &f->e[f->names[lo].index];
    return NULL;
}

static void check_reaction(pxd_file *f, pxd_entry *e, const px_db *known)
{
    const char *rx = e->sp.logk.reaction;
    if (!rx[0]) return;
    px_reaction r;
    char msg[256];
    /* the same parser the thermodynamic core uses later (thermo) */
    if (px_reaction_parse(rx, &r, msg, sizeof msg) != PX_OK) {
        pxd_report_entry(f, e, PX_DATA_ERROR, "reaction", "cannot parse the reaction: %s", msg);
        return;
    }
    double self = 0;
    for (int i = 0; i < r.n; i++) {
        const char *t = r.sp[i].text;
        if (e->formula_ok && strcmp(t, e->sp.f.text) == 0) self = r.nu[i];
        else if (known && !find_in_file(f, t) && !px_db_find(known, t) && !is_builtin(t))
            pxd_report_entry(f, e, PX_DATA_WARNING, "reaction",
                             "'%s' is defined neither in this file nor in the loaded database", t);
    }
    /* thermo resolves G of the species as (dG - sum_others) / nu_self, so any
     * non-zero coefficient on either side is valid; log K is for the reaction
     * as written */
    if (e->formula_ok && self == 0.0)
        pxd_report_entry(f, e, PX_DATA_ERROR, "reaction",
                         "the species %s does not appear in its own reaction", e->raw);
    if (px_reaction_balance(&r, msg, sizeof msg) != PX_OK)
        pxd_report_entry(f, e, PX_DATA_ERROR, "reaction", "does not balance (%s)", msg);
}

static void check_logk(pxd_file *f, pxd_entry *e, const px_db *known)
{
    check_reaction(f, e, known);
    px_logk_params *lk = &e->sp.logk;
    if (e->has_logK_T) {
        double T = PX_TR;
        /* log K = k0 + k1 T + k2/T + k3 log10 T + k4/T^2 (docs/element-files.md) */
        double v = lk->k[0] + lk->k[1] * T + lk->k[2] / T + lk->k[3] * log10(T) + lk->k[4] / (T * T);
        if (e->has_logK && fabs(v - e->logK_given) > LOGK_AGREE_TOL)
            pxd_report_entry(f, e, PX_DATA_WARNING, "logK_T",
                             "logK_T gives %.3f at 25 C but logK is %.3f", v, e->logK_given);
        if (!e->has_logK) lk->logK25 = v;
    }
}

static int in_filter(const pxd_file *f, const px_formula *fm)
{
    if (!f->opt->elements) return 1;
    for (int i = 0; i < fm->n_elem; i++) {
        int z = fm->elem[i].z, ok = z == 1 || z == 8;
        for (size_t j = 0; j < f->opt->n_elements && !ok; j++) ok = f->opt->elements[j] == z;
        if (!ok) return 0;
    }
    return 1;
}

static void resolve_kopp(pxd_file *f, pxd_entry *e, const px_db *known);

static void check_entry(pxd_file *f, pxd_entry *e, const px_db *known)
{
    px_species *sp = &e->sp;
    const px_formula *fm = &sp->f;
    if (e->formula_ok) {
        if (fm->state == PX_STATE_E) {
            pxd_report_entry(f, e, PX_DATA_ERROR, "formula", "the electron is built in");
            return;
        }
        if (fm->charge != 0 && fm->state != PX_STATE_AQ)
            pxd_report_entry(f, e, PX_DATA_ERROR, "formula", "only aqueous species carry a charge");
        if (sp->model == PX_MODEL_HKF && fm->state != PX_STATE_AQ)
            pxd_report_entry(f, e, PX_DATA_ERROR, "model", "model 'hkf' is for aqueous species");
        if (sp->model == PX_MODEL_CP && fm->state == PX_STATE_AQ)
            pxd_report_entry(f, e, PX_DATA_ERROR, "model",
                             "model 'cp' is for solids, liquids and gases; use 'hkf' or 'logk' for "
                             "aqueous species");
        if (!f->opt->user_file && !f->element_ho && is_builtin(fm->text))
            pxd_report_entry(f, e, PX_DATA_ERROR, "formula",
                             "%s is built in: do not define it in an element file", fm->text);
        else
            check_membership(f, e);
        const pxd_entry *o = find_in_file(f, fm->text);
        if (o && o < e)
            pxd_report_entry(f, e, PX_DATA_ERROR, "formula",
                             "defined twice in this file (first at line %d)", o->sp.line);
        if (known && !f->opt->user_file) {
            const px_species *k = px_db_find(known, fm->text);
            if (k && k->file)
                pxd_report_entry(f, e, PX_DATA_ERROR, "formula", "already defined in %s:%d", k->file,
                                 k->line);
            else if (k)
                pxd_report_entry(f, e, PX_DATA_ERROR, "formula", "already defined (built in)");
        }
        e->skip = !in_filter(f, fm);
    }
    if (e->has_S && fm->state != PX_STATE_AQ && e->formula_ok && !(sp->S > 0))
        pxd_report_entry(f, e, PX_DATA_ERROR, "S",
                         "the third-law entropy of a solid, liquid or gas must be positive");
    int before = e->errors;
    check_ranges(f, e);
    if (e->formula_ok && e->errors == before) { /* absurd values: the range error says it all */
        check_cycle(f, e);
        check_magnitude(f, e);
    }
    if (sp->model == PX_MODEL_LOGK) check_logk(f, e, known);
    if (e->want_kopp && e->formula_ok && e->errors == 0 && !e->skip) resolve_kopp(f, e, known);
    if (e->want_estimate && e->formula_ok && e->errors == 0) {
        int st = px_hkf_estimate(sp, e->est_Cp, e->est_V);
        if (st != PX_OK)
            pxd_report_entry(f, e, PX_DATA_ERROR, "estimate", "HKF estimate failed: %s",
                             px_strerror(st));
        sp->estimated = 1;
    }
}

/* Kopp-Neumann estimate of a solid's Cp (px_cp_kopp) from the components
 * named in estimate.from: each a cp species of this file or of the loaded
 * database with a published Cp function.  A component that is not loaded
 * (a file checked alone) leaves Cp at 0 with a warning. */
static void resolve_kopp(pxd_file *f, pxd_entry *e, const px_db *known)
{
    px_species *sp = &e->sp;
    px_formula comp[PXD_KOPP_MAX];
    px_cp_params cps[PXD_KOPP_MAX];
    for (int i = 0; i < e->n_kopp; i++) {
        const char *raw = e->kopp_from[i];
        if (px_formula_parse(raw, &comp[i]) != PX_OK) {
            pxd_report_entry(f, e, PX_DATA_ERROR, "estimate.from", "malformed formula '%s'", raw);
            return;
        }
        const pxd_entry *o = find_in_file(f, comp[i].text);
        const px_species *c = o ? &o->sp : (known ? px_db_find(known, comp[i].text) : NULL);
        if (!c) {
            pxd_report_entry(f, e, PX_DATA_WARNING, "estimate.from",
                             "%s is not loaded: no Cp estimate here (Cp taken as 0)", comp[i].text);
            return;
        }
        int published = c->model == PX_MODEL_CP && c->cp.estimate == PX_CP_EST_NONE &&
                        !(o && o->want_kopp) &&
                        (c->cp.a != 0 || c->cp.b != 0 || c->cp.c != 0 || c->cp.d != 0 || c->cp.e != 0);
        if (!published) {
            pxd_report_entry(f, e, PX_DATA_ERROR, "estimate.from",
                             "%s has no published Cp function (model 'cp' with a 'cp' table)",
                             comp[i].text);
            return;
        }
        cps[i] = c->cp;
    }
    char msg[256];
    px_cp_params out = sp->cp;
    int st = px_cp_kopp(&sp->f, e->n_kopp, comp, e->kopp_nu, cps, &out, msg, sizeof msg);
    if (st != PX_OK) {
        pxd_report_entry(f, e, PX_DATA_ERROR, "estimate", "Kopp-Neumann estimate failed: %s", msg);
        return;
    }
    sp->cp.a = out.a;
    sp->cp.b = out.b;
    sp->cp.c = out.c;
    sp->cp.d = out.d;
    sp->cp.e = out.e;
    sp->cp.estimate = PX_CP_EST_KOPP;
}

/* ---- references ----------------------------------------------------------- */

/* Edit distance of two short keys (Levenshtein 1966), for "did you mean". */
static size_t key_distance(const char *a, const char *b)
{
    size_t na = strlen(a), nb = strlen(b), row[PX_REF_KEY_MAX + 1];
    if (na >= PX_REF_KEY_MAX || nb >= PX_REF_KEY_MAX) return (size_t)-1;
    for (size_t j = 0; j <= nb; j++) row[j] = j;
    for (size_t i = 1; i <= na; i++) {
        size_t diag = row[0];
        row[0] = i;
        for (size_t j = 1; j <= nb; j++) {
            size_t up = row[j];
            size_t sub = diag + (toupper((unsigned char)a[i - 1]) != toupper((unsigned char)b[j - 1]));
            size_t best = up + 1 < row[j - 1] + 1 ? up + 1 : row[j - 1] + 1;
            row[j] = sub < best ? sub : best;
            diag = up;
        }
    }
    return row[nb];
}

#define PXD_KEY_HINT_DISTANCE 3 /* edits within which a key is offered as a hint (common practice, no source) */

static const char *nearest_key(const pxd_file *f, const char *key)
{
    const pxd_file *files[2] = {f, pxd_stdlib_bibliography()};
    const char *best = NULL;
    size_t bd = PXD_KEY_HINT_DISTANCE + 1;
    for (int k = 0; k < 2; k++)
        for (size_t i = 0; files[k] && i < files[k]->n_refs; i++) {
            size_t d = key_distance(key, files[k]->refs[i].key);
            if (d < bd) {
                bd = d;
                best = files[k]->refs[i].key;
            }
        }
    return best;
}

/* Every [KEY] in the source text names a publication. */
static void check_refs(pxd_file *f, pxd_entry *e)
{
    char key[PX_REF_KEY_MAX];
    size_t pos = 0;
    while (px_ref_next(e->sp.source, &pos, key)) {
        const char *st, *ci;
        if (pxd_ref_lookup(f, key, &st, &ci)) continue;
        const char *near = nearest_key(f, key);
        char hint[PX_REF_KEY_MAX + 32] = "";
        if (near) snprintf(hint, sizeof hint, " (did you mean [%s]?)", near);
        pxd_report_entry(f, e, PX_DATA_ERROR, "source",
                         "unknown reference [%s]%s: keys are defined in stdlib/bibliography.lua or in the "
                         "file's own `sources` table",
                         key, hint);
    }
}

/* A file's own keys: not another citation under a key already in use, and
 * each cited by some species. */
static void check_file_refs(pxd_file *f)
{
    if (f->bibliography) return; /* (and the standard one is being read: no lookup) */
    const pxd_file *bib = pxd_stdlib_bibliography();
    for (size_t i = 0; i < f->n_refs; i++) {
        const pxd_ref *r = &f->refs[i];
        char field[PX_REF_KEY_MAX + 16];
        snprintf(field, sizeof field, "sources.%s", r->key);
        const char *other = NULL, *where = NULL;
        const px_ref *k = f->known ? px_db_ref_find(f->known, r->key) : NULL;
        if (k) {
            other = k->cite;
            where = "a file loaded before";
        }
        for (size_t j = 0; !other && bib && bib != f && j < bib->n_refs; j++)
            if (strcmp(bib->refs[j].key, r->key) == 0) {
                other = bib->refs[j].cite;
                where = "stdlib/bibliography.lua";
            }
        if (other && strcmp(other, r->cite) != 0)
            pxd_report(f, PX_DATA_ERROR, r->line, "", field,
                       "key [%s] already names another publication in %s; choose another key", r->key, where);
        else if (!f->bibliography && !r->cited)
            pxd_report(f, PX_DATA_WARNING, r->line, "", field, "defined but cited by no species");
    }
}

void pxd_check_file(pxd_file *f, const px_db *known)
{
    build_names(f);
    if (f->oom) return;
    for (size_t i = 0; i < f->n; i++) {
        check_entry(f, &f->e[i], known);
        check_refs(f, &f->e[i]);
    }
    check_file_refs(f);
    for (size_t i = 0; i < f->n_ex; i++) {
        px_formula fm;
        pxd_exclude *x = &f->ex[i];
        if (px_formula_parse(x->raw, &fm) != PX_OK) {
            pxd_report(f, PX_DATA_ERROR, x->line, x->raw, "exclude", "malformed formula");
            continue;
        } else if (known && !find_in_file(f, fm.text)) {
            char why[512]; /* "ZnO(s)" names the only solid of that formula; else an error with the candidates */
            if (px_db_resolve(known, x->raw, NULL, why, sizeof why) != PX_OK)
                pxd_report(f, PX_DATA_ERROR, x->line, x->raw, "exclude", "%s", why);
        }
        if (find_in_file(f, fm.text))
            pxd_report(f, PX_DATA_WARNING, x->line, x->raw, "exclude",
                       "excluded and defined in the same file: the definition is loaded");
    }
}
