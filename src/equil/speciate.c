/* speciate.c - from the species database to the generic solver (see
 * speciate.h). */
#include "equil/speciate.h"
#include "core/alloc.h"
#include "core/constants.h"
#include "core/status.h"
#include "thermo/basis.h"
#include "water/water.h"
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define Z_H 1
#define Z_O 8
#define PX_SPEC_NU_EPS 1e-9

/* B-dot of Helgeson 1969 (Am. J. Sci. 267, 729), table for NaCl solutions,
 * from memory: 0.041 kg/mol at 25 C, rising to about 0.047 at 150-200 C and
 * falling to 0.035 at 300 C. */
static const double bdot_T[] = {273.15, 298.15, 323.15, 373.15, 423.15, 473.15, 523.15, 573.15};
static const double bdot_v[] = {0.0374, 0.0410, 0.0430, 0.0460, 0.0470, 0.0470, 0.0440, 0.0350};

double px_spec_bdot(double T)
{
    size_t n = sizeof bdot_T / sizeof bdot_T[0];
    if (!(T >= bdot_T[0] && T <= bdot_T[n - 1])) return NAN;
    for (size_t i = 1; i < n; i++)
        if (T <= bdot_T[i]) {
            double t = (T - bdot_T[i - 1]) / (bdot_T[i] - bdot_T[i - 1]);
            return bdot_v[i - 1] + t * (bdot_v[i] - bdot_v[i - 1]);
        }
    return bdot_v[n - 1];
}

double px_spec_ion_size(int charge)
{
    int a = charge < 0 ? -charge : charge;
    return a == 0 ? 0.0 : a == 1 ? 4.0 : a == 2 ? 5.0 : a == 3 ? 6.0 : 7.0;
}

px_spec_options px_spec_options_default(void)
{
    px_spec_options o;
    memset(&o, 0, sizeof o);
    o.T = PX_TR;
    o.P = PX_PR;
    o.ph_mode = PX_SPEC_PH_CHARGE;
    o.pH = 7.0;
    o.solids = 1;
    o.model = PX_EQUIL_DAVIES;
    o.ligands = px_ligand_states_default();
    o.solver = px_equil_options_default();
    return o;
}

void px_spec_free(px_spec *s)
{
    if (!s) return;
    const px_allocator *a = s->alloc;
    px_equil_work_free(s->work);
    px_equil_system_free(s->sys);
    px_free(a, s->db_index);
    px_free(a, s->nu);
    px_free(a, s->elem_z);
    px_free(a, s);
}

/* Conventional basis species: the form in which water analyses and
 * hydrometallurgical recipes usually state an element's total (common
 * practice, no source).  Without a redox constraint each element stays in
 * the oxidation state of its basis species, so the choice matters: sulfur
 * as sulfate, nitrogen as ammonium (ammine complexes), iron as Fe(II). */
static const char *const conventional_basis[][2] = {
    {"C", "HCO3^-"}, {"S", "SO4^2-"}, {"N", "NH4^+"},   {"P", "H2PO4^-"}, {"F", "F^-"},
    {"Cl", "Cl^-"},  {"Fe", "Fe^2+"}, {"Mn", "Mn^2+"},  {"Cr", "Cr^3+"},  {"Cu", "Cu^2+"},
    {"Co", "Co^2+"}, {"Sn", "Sn^2+"}, {"Mo", "MoO4^2-"}, {"Pb", "Pb^2+"}, {"Al", "Al^3+"},
};

/* The basis species of element z: the conventional one if the database has
 * it, else the aqueous species with one atom of z,
 * otherwise only H and O, fewest atoms, then smallest |charge|, then the
 * first in the database (deterministic). */
static long choose_basis(const px_db *db, int z, const px_ligand_states *ls)
{
    for (size_t k = 0; k < sizeof conventional_basis / sizeof conventional_basis[0]; k++)
        if (px_element_z(conventional_basis[k][0]) == z) {
            long i = px_db_index(db, conventional_basis[k][1]);
            if (i >= 0 && px_ligand_allows(ls, db, &px_db_get(db, (size_t)i)->f, 0)) return i;
        }
    long best = -1;
    double best_atoms = INFINITY;
    int best_q = 1000;
    for (size_t i = 0; i < px_db_count(db); i++) {
        const px_formula *f = &px_db_get(db, i)->f;
        if (f->state != PX_STATE_AQ || px_formula_count(f, z) != 1.0) continue;
        int ok = 1;
        double atoms = 0;
        for (int e = 0; e < f->n_elem; e++) {
            if (f->elem[e].z != z && f->elem[e].z != Z_H && f->elem[e].z != Z_O) ok = 0;
            atoms += f->elem[e].n;
        }
        int q = abs(f->charge);
        ok = ok && px_ligand_allows(ls, db, f, 0);
        if (ok && (atoms < best_atoms || (atoms == best_atoms && q < best_q))) {
            best = (long)i;
            best_atoms = atoms;
            best_q = q;
        }
    }
    return best;
}

static int set_activity_model(px_spec *s, const px_water_state *w, double T, px_equil_model model)
{
    px_equil_activity act = px_equil_activity_default();
    act.model = model;
    act.A = w->A_gamma;
    act.B = w->B_gamma;
    act.bdot = px_spec_bdot(T);
    if (!isfinite(act.bdot)) act.bdot = 0.0;
    act.water = model == PX_EQUIL_IDEAL ? PX_EQUIL_WATER_UNITY : PX_EQUIL_WATER_IDEAL;
    return px_equil_system_set_activity(s->sys, &act);
}

/* SIT: eps(j,k) of every cation-anion pair of the system from the built-in
 * table (equil_sit_data.c, 25 C values); pairs the table lacks keep eps = 0
 * and are counted (Grenthe, Plyasunov and Spahiu 1997: only ions of
 * opposite charge interact specifically). */
static void set_sit_pairs(px_spec *s, const px_db *db)
{
    for (size_t j = 0; j < s->n_species; j++) {
        const px_formula *fj = &px_db_get(db, (size_t)s->db_index[j])->f;
        if (fj->state != PX_STATE_AQ || fj->charge <= 0) continue;
        for (size_t k = 0; k < s->n_species; k++) {
            const px_formula *fk = &px_db_get(db, (size_t)s->db_index[k])->f;
            if (fk->state != PX_STATE_AQ || fk->charge >= 0) continue;
            double eps;
            if (px_equil_sit_lookup(fj->text, fk->text, &eps) == PX_OK &&
                px_equil_system_set_sit(s->sys, j, k, eps) == PX_OK)
                s->sit_pairs++;
            else
                s->sit_missing++;
        }
    }
}

static int eval_logk(px_spec *s, px_thermo_ws *ws, const px_db *db, double T, double P, char *msg,
                     size_t msglen)
{
    size_t nb = s->n_basis;
    double *Gb = px_calloc(s->alloc, nb, sizeof *Gb);
    if (!Gb) return PX_ENOMEM;
    int st = PX_OK;
    for (size_t i = 0; i < nb && st == PX_OK; i++)
        st = px_thermo_species_G(ws, db, px_db_get(db, (size_t)s->db_index[i]), T, P, &Gb[i]);
    for (size_t j = nb; j < s->n_species && st == PX_OK; j++) {
        const px_species *sp = px_db_get(db, (size_t)s->db_index[j]);
        double G;
        st = px_thermo_species_G(ws, db, sp, T, P, &G);
        if (st != PX_OK) {
            px_fail(msg, msglen, st, "%s at %.2f K: %s", sp->f.text, T, px_thermo_ws_error(ws));
            break;
        }
        /* formation from the basis: dG = G_j - sum nu G_b; log K = -dG/(RT ln10) */
        double dG = G;
        for (size_t i = 0; i < nb; i++) dG -= s->nu[j * nb + i] * Gb[i];
        double logk = -dG / (PX_R * T * PX_LN10);
        st = px_equil_system_set_log_k(s->sys, j, logk);
    }
    px_free(s->alloc, Gb);
    if (st != PX_OK && msg && !msg[0]) px_fail(msg, msglen, st, "log K at %.2f K: %s", T, px_strerror(st));
    return st;
}

int px_spec_set_TP(px_spec *s, px_thermo_ws *ws, const px_db *db, double T, double P,
                   px_equil_model model, char *msg, size_t msglen)
{
    const px_water_state *w;
    int st = px_thermo_ws_water(ws, T, P, &w);
    if (st != PX_OK) return px_fail(msg, msglen, st, "water at %.2f K, %.4g bar: %s", T, P, px_strerror(st));
    st = eval_logk(s, ws, db, T, P, msg, msglen);
    if (st == PX_OK) st = set_activity_model(s, w, T, model);
    if (st == PX_OK) s->T = T;
    return st;
}

int px_spec_build(px_thermo_ws *ws, const px_db *db, const px_spec_options *o, px_spec **out,
                  char *msg, size_t msglen)
{
    if (!ws || !db || !o || !out) return PX_EINVAL;
    *out = NULL;
    if (msg && msglen) msg[0] = '\0';
    if (o->n_totals == 0 || o->n_totals > PX_SPEC_MAX_ITEMS - 3)
        return px_fail(msg, msglen, PX_EINVAL, "give between 1 and %d element totals", PX_SPEC_MAX_ITEMS - 3);
    /* every named species must exist: a misspelt exclude is an error, not a no-op */
    int st0 = px_db_check_list(db, "exclude", o->exclude, o->n_exclude, msg, msglen);
    if (st0 == PX_OK) st0 = px_db_check_list(db, "suppress", o->suppress, o->n_suppress, msg, msglen);
    if (st0 == PX_OK) st0 = px_db_check_list(db, "fixed", o->fixed, o->n_fixed, msg, msglen);
    if (st0 == PX_OK) st0 = px_db_check_list(db, "fugacities", o->gas, o->n_gases, msg, msglen);
    if (st0 == PX_OK && o->redox_mode == PX_SPEC_REDOX_GAS)
        st0 = px_db_check_list(db, "redox_gas", &o->redox_gas, 1, msg, msglen);
    if (st0 != PX_OK) return st0;
    px_spec *s = px_calloc(o->alloc, 1, sizeof *s);
    if (!s) return PX_ENOMEM;
    s->alloc = o->alloc;
    size_t nb = o->n_totals + 3;
    s->n_basis = nb;
    long bidx[PX_SPEC_MAX_ITEMS];
    int st = PX_OK;
    bidx[PX_SPEC_BASIS_WATER] = px_db_index(db, "H2O(l)");
    bidx[PX_SPEC_BASIS_H] = px_db_index(db, "H^+");
    bidx[PX_SPEC_BASIS_E] = px_db_index(db, "e-");
    if (bidx[PX_SPEC_BASIS_WATER] < 0 || bidx[PX_SPEC_BASIS_H] < 0 || bidx[PX_SPEC_BASIS_E] < 0) {
        st = px_fail(msg, msglen, PX_ENOTFOUND, "the database lacks H2O(l), H^+ or e-");
        goto fail;
    }
    s->elem_z = px_calloc(s->alloc, nb, sizeof *s->elem_z);
    if (!s->elem_z) {
        st = PX_ENOMEM;
        goto fail;
    }
    for (size_t k = 0; k < o->n_totals; k++) {
        int z = px_element_z(o->element[k]);
        if (!z || z == Z_H || z == Z_O) {
            st = px_fail(msg, msglen, PX_EINVAL, "totals: unknown or unsupported element '%s'",
                      o->element[k] ? o->element[k] : "?");
            goto fail;
        }
        for (size_t q = 0; q < k; q++)
            if (s->elem_z[q + 3] == z) {
                st = px_fail(msg, msglen, PX_EINVAL, "totals: %s given twice", o->element[k]);
                goto fail;
            }
        if (!(o->total[k] >= 0) || !isfinite(o->total[k])) {
            st = px_fail(msg, msglen, PX_EINVAL, "totals: %s must be a finite number >= 0 mol/kg", o->element[k]);
            goto fail;
        }
        s->elem_z[k + 3] = z;
        if (o->basis[k]) {
            char why[400];
            if (px_db_resolve(db, o->basis[k], &bidx[k + 3], why, sizeof why) != PX_OK) {
                st = px_fail(msg, msglen, PX_ENOTFOUND, "basis of %s: %s", o->element[k], why);
                goto fail;
            }
            /* each element's total is carried by its basis species alone: one
             * that holds another element (CN^- for C) would hide that
             * element's atoms from its own balance */
            const px_formula *bfk = &px_db_get(db, (size_t)bidx[k + 3])->f;
            for (int e = 0; e < bfk->n_elem; e++)
                if (bfk->elem[e].z != z && bfk->elem[e].z != Z_H && bfk->elem[e].z != Z_O) {
                    st = px_fail(msg, msglen, PX_EINVAL,
                                 "basis of %s: %s holds %s too; a basis species may hold one element besides "
                                 "H and O", o->element[k], bfk->text, px_element_symbol(bfk->elem[e].z));
                    goto fail;
                }
        } else {
            bidx[k + 3] = choose_basis(db, z, &o->ligands);
        }
        if (bidx[k + 3] < 0) {
            st = px_fail(msg, msglen, PX_ENOTFOUND, "no aqueous basis species for %s%s%s", o->element[k],
                      o->basis[k] ? ": " : "", o->basis[k] ? o->basis[k] : "");
            goto fail;
        }
    }
    int redox = o->redox_mode != PX_SPEC_REDOX_NONE;
    s->redox = redox;
    /* species: basis first, then every other species made of the elements */
    size_t ndb = px_db_count(db);
    s->db_index = px_calloc(s->alloc, ndb + nb, sizeof *s->db_index);
    s->nu = px_calloc(s->alloc, (ndb + nb) * nb, sizeof *s->nu);
    if (!s->db_index || !s->nu) {
        st = PX_ENOMEM;
        goto fail;
    }
    const px_formula *bf[PX_SPEC_MAX_ITEMS];
    for (size_t i = 0; i < nb; i++) {
        s->db_index[i] = bidx[i];
        bf[i] = &px_db_get(db, (size_t)bidx[i])->f;
        s->nu[i * nb + i] = 1.0;
    }
    size_t m = nb;
    for (size_t d = 0; d < ndb; d++) {
        const px_species *sp = px_db_get(db, d);
        int is_basis = 0;
        for (size_t i = 0; i < nb; i++) is_basis |= bidx[i] == (long)d;
        if (is_basis || sp->f.state == PX_STATE_E) continue;
        int ok = 1;
        for (int e = 0; e < sp->f.n_elem && ok; e++) {
            int z = sp->f.elem[e].z, in = z == Z_H || z == Z_O;
            for (size_t i = 3; i < nb; i++) in |= s->elem_z[i] == z;
            ok = in;
        }
        if (!ok || px_db_listed(db, o->exclude, o->n_exclude, (long)d)) continue;
        if (!px_ligand_allows(&o->ligands, db, &sp->f, 0)) continue; /* ligand kept in its form */
        if (sp->f.state == PX_STATE_L) continue; /* other liquids than water: not modelled */
        double *nu = s->nu + m * nb;
        if (px_basis_formation(bf, nb, &sp->f, nu, NULL, 0) != PX_OK) continue;
        if (!redox && fabs(nu[2]) > PX_SPEC_NU_EPS) continue; /* needs electrons */
        s->db_index[m++] = (long)d;
    }
    s->n_species = m;
    st = px_equil_system_create(&s->sys, nb, m, s->alloc);
    if (st != PX_OK) goto fail;
    for (size_t j = 0; j < m && st == PX_OK; j++) {
        const px_species *sp = px_db_get(db, (size_t)s->db_index[j]);
        px_equil_species es = {j < nb ? NULL : s->nu + j * nb, 0.0, (double)sp->f.charge,
                               PX_EQUIL_AQ, px_spec_ion_size(sp->f.charge), 0u};
        switch (sp->f.state) {
        case PX_STATE_S: es.phase = PX_EQUIL_SOLID; break;
        case PX_STATE_G: es.phase = PX_EQUIL_GAS; break;
        case PX_STATE_E: es.phase = PX_EQUIL_ELECTRON; break;
        case PX_STATE_L: es.phase = PX_EQUIL_WATER; break;
        default: es.phase = PX_EQUIL_AQ; break;
        }
        if (es.phase == PX_EQUIL_SOLID && (!o->solids || px_db_listed(db, o->suppress, o->n_suppress, s->db_index[j]) ||
                                           (!o->allow_inhibited && px_inhibited_at(&sp->f, o->T))))
            es.flags |= PX_EQUIL_SUPPRESSED;
        st = px_equil_system_set_species(s->sys, j, &es);
        if (st != PX_OK) px_fail(msg, msglen, st, "species %s: %s", sp->f.text, px_strerror(st));
    }
    if (st != PX_OK) goto fail;
    if (o->model == PX_EQUIL_SIT) set_sit_pairs(s, db);
    st = px_spec_set_TP(s, ws, db, o->T, o->P, o->model, msg, msglen);
    if (st != PX_OK) goto fail;

    /* constraints: water has none; totals per element; pH; redox */
    for (size_t k = 0; k < o->n_totals && st == PX_OK; k++)
        st = px_equil_system_set_total(s->sys, k + 3, o->total[k]);
    if (st == PX_OK)
        st = o->ph_mode == PX_SPEC_PH_FIXED ? px_equil_system_set_ph(s->sys, 1, o->pH)
                                            : px_equil_system_set_charge_balance(s->sys, 1);
    if (st != PX_OK) {
        px_fail(msg, msglen, st, "pH constraint: %s", px_strerror(st));
        goto fail;
    }
    switch (o->redox_mode) {
    case PX_SPEC_REDOX_E: st = px_equil_system_set_eh(s->sys, 2, o->E, o->T); break;
    case PX_SPEC_REDOX_PE: st = px_equil_system_set_pe(s->sys, 2, o->pe); break;
    case PX_SPEC_REDOX_GAS: {
        long g = -1;
        for (size_t j = nb; j < m; j++)
            if (px_db_listed(db, &o->redox_gas, 1, s->db_index[j])) g = (long)j;
        if (g < 0) {
            st = px_fail(msg, msglen, PX_ENOTFOUND, "redox gas '%s' is not among the species",
                      o->redox_gas ? o->redox_gas : "?");
            goto fail;
        }
        st = px_equil_system_set_fugacity(s->sys, 2, (size_t)g, o->redox_log_f);
        break;
    }
    default: st = px_equil_system_set_pe(s->sys, 2, 0.0); break; /* no species depends on it */
    }
    if (st != PX_OK) {
        px_fail(msg, msglen, st, "redox constraint: %s", px_strerror(st));
        goto fail;
    }
    /* fixed gas fugacities replace the balance of the element they carry */
    for (size_t q = 0; q < o->n_gases; q++) {
        long g = -1;
        for (size_t j = nb; j < m; j++)
            if (px_db_listed(db, &o->gas[q], 1, s->db_index[j])) g = (long)j;
        if (g < 0) {
            st = px_fail(msg, msglen, PX_ENOTFOUND, "gas '%s' is not among the species", o->gas[q]);
            goto fail;
        }
        size_t comp = 0;
        for (size_t i = 3; i < nb && !comp; i++)
            if (fabs(s->nu[(size_t)g * nb + i]) > PX_SPEC_NU_EPS) comp = i;
        if (!comp) {
            st = px_fail(msg, msglen, PX_EINVAL, "gas '%s' carries none of the elements with totals", o->gas[q]);
            goto fail;
        }
        st = px_equil_system_set_fugacity(s->sys, comp, (size_t)g, o->gas_log_f[q]);
        if (st != PX_OK) {
            px_fail(msg, msglen, st, "fugacity of %s: %s", o->gas[q], px_strerror(st));
            goto fail;
        }
    }
    for (size_t q = 0; q < o->n_fixed; q++) {
        size_t comp = 0;
        for (size_t i = 3; i < nb; i++)
            if (px_db_listed(db, &o->fixed[q], 1, bidx[i])) comp = i;
        if (!comp) {
            st = px_fail(msg, msglen, PX_EINVAL, "fixed activity: %s is not a basis species", o->fixed[q]);
            goto fail;
        }
        st = px_equil_system_set_log_activity(s->sys, comp, o->fixed_log_a[q]);
        if (st != PX_OK) goto fail;
    }
    st = px_equil_work_create(&s->work, s->sys, s->alloc);
    if (st != PX_OK) goto fail;
    *out = s;
    return PX_OK;
fail:
    px_spec_free(s);
    return st;
}

int px_spec_set_pH(px_spec *s, double pH)
{
    px_equil_component_result c;
    if (!s || px_equil_work_get_component(s->work, PX_SPEC_BASIS_H, &c) != PX_OK || c.kind != PX_EQUIL_C_ACTIVITY)
        return PX_EINVAL;
    return px_equil_system_set_ph(s->sys, PX_SPEC_BASIS_H, pH);
}

int px_spec_set_total(px_spec *s, size_t k, double total)
{
    if (!s || k >= px_spec_n_elements(s)) return PX_EINVAL;
    return px_equil_system_set_total(s->sys, PX_SPEC_BASIS_ELEMENTS + k, total);
}

int px_spec_set_fixed(px_spec *s, const px_db *db, const char *species, double log_a)
{
    long d = s && db && species ? px_db_index(db, species) : -1;
    px_equil_component_result c;
    for (size_t i = PX_SPEC_BASIS_ELEMENTS; d >= 0 && i < s->n_basis; i++)
        if (s->db_index[i] == d) {
            if (px_equil_work_get_component(s->work, i, &c) != PX_OK || c.kind != PX_EQUIL_C_ACTIVITY)
                return PX_EINVAL;
            return px_equil_system_set_log_activity(s->sys, i, log_a);
        }
    return PX_EINVAL;
}

/* Continuation in the totals: solve with every element total scaled down
 * (where cold starts are easy), then raise them in steps, each solve warm
 * from the last.  A standard homotopy for stiff equilibrium problems (e.g.
 * Smith and Missen 1982, ch. 6); used only when a plain solve fails.  The
 * steps are a decade each; a step that fails is taken again from the last
 * solution at half the length, and the length doubles back after a success
 * (step-length adaptation, Allgower and Georg 1990, Numerical Continuation
 * Methods, ch. 6): a polynuclear species (Al13O4(OH)24^7+, 13 Al) moves as
 * the 13th power of its basis species, too far for one decade near where a
 * solid starts to form.  Numerical choices, no source: */
#define PX_SPEC_CONT_DECADES 5                  /* first totals: 10^-5 of the given */
#define PX_SPEC_CONT_MIN_STEP (1.0 / 64.0)       /* shortest step tried, decades */
#define PX_SPEC_CONT_MAX_SOLVES 64               /* solves in one continuation */
static double cont_scale(double t)
{
    /* whole decades as the literals 1e-5 .. 1 (the scales of the plain
     * decade steps), the steps between by pow */
    static const double decade[PX_SPEC_CONT_DECADES + 1] = {1e-5, 1e-4, 1e-3, 1e-2, 1e-1, 1.0};
    double k = t + PX_SPEC_CONT_DECADES;
    if (k == floor(k) && k >= 0 && k <= PX_SPEC_CONT_DECADES) return decade[(int)k];
    return pow(10.0, t);
}

static int solve_by_continuation(px_spec *s, const px_equil_options *opt)
{
    size_t nb = s->n_basis;
    px_equil_component_result c;
    double given[PX_SPEC_MAX_ITEMS];
    int is_total[PX_SPEC_MAX_ITEMS];
    for (size_t i = 0; i < nb; i++) {
        is_total[i] = px_equil_work_get_component(s->work, i, &c) == PX_OK && c.kind == PX_EQUIL_C_TOTAL;
        given[i] = is_total[i] ? c.total_given : 0.0;
    }
    px_equil_options o = opt ? *opt : px_equil_options_default();
    o.warm = 1;
    px_equil_work_reset(s->work);
    px_equil_work *last = NULL; /* the last solution, for a step taken again */
    double t = -PX_SPEC_CONT_DECADES, step = 1.0, t_ok = t;
    int st = PX_OK, have_last = 0, reached = 0;
    for (int n = 0; n < PX_SPEC_CONT_MAX_SOLVES; n++) {
        double f = cont_scale(t);
        for (size_t i = 0; i < nb; i++)
            if (is_total[i]) px_equil_system_set_total(s->sys, i, given[i] * f);
        st = px_equil_solve(s->sys, s->work, &o);
        if (st == PX_OK) {
            if (t >= 0.0) {
                reached = 1;
                break;
            }
            if (!last && px_equil_work_create(&last, s->sys, s->alloc) != PX_OK) {
                st = PX_ENOMEM;
                break;
            }
            have_last = px_equil_work_copy_state(last, s->work) == PX_OK;
            t_ok = t;
            step = fmin(2.0 * step, 1.0);
        } else {
            /* the first solve (cold) has nothing to go back to */
            if (!have_last || step <= PX_SPEC_CONT_MIN_STEP) break;
            step *= 0.5;
            px_equil_work_copy_state(s->work, last);
        }
        t = fmin(t_ok + step, 0.0);
    }
    if (last) px_equil_work_free(last);
    if (st == PX_OK && !reached) st = PX_ENOCONV; /* out of solves short of the given totals */
    for (size_t i = 0; i < nb; i++) /* the given totals, whatever happened */
        if (is_total[i]) px_equil_system_set_total(s->sys, i, given[i]);
    return st;
}

int px_spec_solve(px_spec *s, const px_equil_options *opt, char *msg, size_t msglen)
{
    int st = px_equil_solve(s->sys, s->work, opt);
    if (st == PX_ENOCONV || st == PX_ESINGULAR) st = solve_by_continuation(s, opt);
    if (st != PX_OK && msg && msglen) {
        px_equil_stats stats;
        px_equil_work_get_stats(s->work, &stats);
        static const char *const kinds[] = {"none", "mass balance", "activity", "fugacity", "charge balance",
                                            "water", "ionic strength", "solid saturation", "solid active set"};
        const char *k = stats.fail_kind >= 0 && stats.fail_kind <= PX_EQUIL_C_ACTIVE_SET ? kinds[stats.fail_kind] : "?";
        snprintf(msg, msglen, "%s after %zu iterations: %s (equation %zu) did not close, residual %.3g",
                 px_strerror(st), stats.iterations, k, stats.fail_index, stats.residual_norm);
    }
    return st;
}

double px_spec_pH(const px_spec *s)
{
    px_equil_species_result r;
    if (!s || px_equil_work_get_species(s->work, PX_SPEC_BASIS_H, &r) != PX_OK) return NAN;
    return -r.log_activity;
}

int px_spec_redox_state(const px_spec *s, double *pe, double *E)
{
    px_equil_species_result r;
    if (!s || !s->redox || !pe || !E) return PX_EINVAL;
    int st = px_equil_work_get_species(s->work, PX_SPEC_BASIS_E, &r);
    if (st != PX_OK) return st;
    *pe = -r.log_activity;
    /* E = pe RT ln10 / F (DESIGN.md conventions; CODATA 2018 F and R) */
    *E = *pe * PX_R * s->T * PX_LN10 / PX_F;
    return PX_OK;
}

size_t px_spec_n_elements(const px_spec *s)
{
    return s && s->n_basis > PX_SPEC_BASIS_ELEMENTS ? s->n_basis - PX_SPEC_BASIS_ELEMENTS : 0;
}

int px_spec_element(const px_spec *s, size_t k, px_spec_element_result *out)
{
    if (!out || k >= px_spec_n_elements(s)) return PX_EINVAL;
    px_equil_component_result c;
    int st = px_equil_work_get_component(s->work, PX_SPEC_BASIS_ELEMENTS + k, &c);
    if (st != PX_OK) return st;
    out->z = s->elem_z[PX_SPEC_BASIS_ELEMENTS + k];
    out->dissolved = c.total_aq;
    out->solid = c.total_solid;
    out->total = c.total_aq + c.total_solid;
    return PX_OK;
}

double px_spec_element_share(const px_spec *s, size_t k, size_t j)
{
    px_spec_element_result e;
    px_equil_species_result r;
    if (px_spec_element(s, k, &e) != PX_OK || j >= s->n_species) return NAN;
    double nu = s->nu[j * s->n_basis + PX_SPEC_BASIS_ELEMENTS + k];
    if (nu == 0.0 || px_equil_work_get_species(s->work, j, &r) != PX_OK) return NAN;
    double amount = r.molality > 0 ? r.molality : r.amount;
    if (!(amount > 0) || !(e.total > 0)) return NAN;
    return nu * amount / e.total;
}
