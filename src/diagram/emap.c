/* emap.c - element maps: from species data to the affine functions of the
 * exact predominance map, and back to species, kinds and reactions (see
 * emap.h for the method). */
#include "core/alloc.h"
#include "diagram/emap.h"
#include "core/constants.h"
#include "core/status.h"
#include "equil/equil.h"
#include "geom/geom.h"
#include "thermo/basis.h"
#include <ctype.h>
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define Z_H 1
#define Z_O 8
#define PX_EMAP_COEF_EPS 1e-9    /* a reaction coefficient this close to 0 is 0 */
#define PX_EMAP_MAX_SCALE 60     /* largest multiplier tried to clear fractions */

px_emap_options px_emap_options_default(void)
{
    px_emap_options o;
    memset(&o, 0, sizeof o);
    o.T = PX_TR;
    o.P = PX_PR;
    o.xaxis = PX_AXIS_PH;
    o.yaxis = PX_AXIS_E;
    o.window = (px_diagram_window){0.0, 14.0, -2.0, 2.0};
    o.pH = 7.0;
    o.E = 0.0;
    o.activity = PX_EMAP_DEFAULT_ACTIVITY;
    o.ligand_activity = PX_EMAP_DEFAULT_LIGAND;
    o.ligands = px_ligand_states_default();
    return o;
}

/* Elements of f are all within {H, O, a, b}. */
/* A polyatomic ligand ("CN", "SCN"): its first element stands for the
 * ligand, the others travel with it in fixed ratio, so every species of the
 * ligand keeps the group intact (cyanide stays cyanide: its oxidation to
 * carbonate and nitrogen species is left out, the metastable convention of
 * cyanide diagrams; docs/diagrams.md). */
#define LIG_MAX_ELEM 4
typedef struct ligand_group {
    int z;                   /* the ligand's first element, 0 without ligand */
    int n_extra;
    int extra[LIG_MAX_ELEM]; /* companion elements */
    double ratio[LIG_MAX_ELEM]; /* atoms of extra[k] per atom of z */
} ligand_group;

/* "Cl", "S", "CN", "SCN", "C2N2": element symbols with optional counts. */
static int ligand_parse(const char *s, ligand_group *g)
{
    memset(g, 0, sizeof *g);
    double first = 0;
    while (*s) {
        char sym[3] = {0, 0, 0};
        if (!isupper((unsigned char)*s)) return PX_EINVAL;
        sym[0] = *s++;
        if (islower((unsigned char)*s)) sym[1] = *s++;
        double n = 0;
        while (isdigit((unsigned char)*s)) n = 10 * n + (*s++ - '0');
        if (n == 0) n = 1;
        int z = px_element_z(sym);
        if (!z || z == Z_H || z == Z_O) return PX_EINVAL;
        if (!g->z) {
            g->z = z;
            first = n;
            continue;
        }
        if (z == g->z || g->n_extra == LIG_MAX_ELEM) return PX_EINVAL;
        for (int k = 0; k < g->n_extra; k++)
            if (g->extra[k] == z) return PX_EINVAL;
        g->extra[g->n_extra] = z;
        g->ratio[g->n_extra++] = n / first;
    }
    return g->z ? PX_OK : PX_EINVAL;
}

/* f is made of H, O, element a and optionally b only; where a or b is the
 * ligand group's element, its companions may appear, in the group's ratio. */
static int made_of(const px_formula *f, int a, int b, const ligand_group *g)
{
    int lig = g && g->z && (a == g->z || b == g->z);
    for (int i = 0; i < f->n_elem; i++) {
        int z = f->elem[i].z, ok = z == Z_H || z == Z_O || z == a || (b && z == b);
        for (int k = 0; lig && k < g->n_extra && !ok; k++) ok = z == g->extra[k];
        if (!ok) return 0;
    }
    for (int k = 0; lig && k < g->n_extra; k++)
        if (fabs(px_formula_count(f, g->extra[k]) - g->ratio[k] * px_formula_count(f, g->z)) > 1e-9) return 0;
    return 1;
}

static px_emap_kind kind_of(const px_formula *f, int zM)
{
    switch (f->state) {
    case PX_STATE_AQ: return PX_EMAP_AQUEOUS;
    case PX_STATE_G: return PX_EMAP_GAS;
    case PX_STATE_L: return PX_EMAP_LIQUID;
    default: return f->n_elem == 1 && f->elem[0].z == zM ? PX_EMAP_METAL : PX_EMAP_SOLID;
    }
}

/* Everything needed to turn one species into Phi on given axes. */
typedef struct cand {
    long db;            /* db index */
    const px_species *sp;
    double G;           /* J/mol at T, P */
    double ln_a;        /* ln activity (aqueous), ln fugacity (gas), 0 (condensed) */
    int on_axis_activity; /* aqueous ligand species: a follows the log a(L) axis */
} cand;

typedef struct ctx {
    const px_emap_options *o;
    double RT, T;
    double G_h2o, G_h, G_e;
    const px_species *h2o, *hplus, *elec;
    ligand_group lig;
    px_ligand_states ls; /* o->ligands, less the rules of a ligand group's elements */
    char *msg;
    size_t msglen;
} ctx;

/* f without the ligand group's companion elements: they travel with the
 * group's first element in fixed ratio, so balancing that element balances
 * them (made_of checked the ratio). */
static px_formula strip_group(const ctx *c, const px_formula *f)
{
    px_formula r = *f;
    int n = 0;
    for (int i = 0; i < f->n_elem; i++) {
        int extra = 0;
        for (int k = 0; k < c->lig.n_extra; k++) extra |= f->elem[i].z == c->lig.extra[k];
        if (!extra) r.elem[n++] = f->elem[i];
    }
    r.n_elem = n;
    return r;
}

static double axis_value(const ctx *c, px_emap_axis ax)
{
    return ax == PX_AXIS_PH ? c->o->pH : ax == PX_AXIS_E ? c->o->E : log10(c->o->ligand_activity);
}

/* Phi of `cd` per atom of element z over basis (H2O, H+, e-, ref[, lig]).
 * ligand_basis_ln_a: ln activity of the ligand basis species when it is not
 * on an axis; lig_on_axis: its activity follows the log a axis. */
static int phi_of(const ctx *c, const cand *cd, int z, const px_species *ref, double G_ref,
                  const cand *lig, px_diagram_species *out)
{
    px_formula fref = strip_group(c, &ref->f), flig = lig ? strip_group(c, &lig->sp->f) : fref,
               fcd = strip_group(c, &cd->sp->f);
    const px_formula *basis[5] = {&c->h2o->f, &c->hplus->f, &c->elec->f, &fref, lig ? &flig : NULL};
    size_t nb = lig ? 5 : 4;
    double nu[5];
    char why[160];
    int st = px_basis_formation(basis, nb, &fcd, nu, why, sizeof why);
    if (st != PX_OK)
        return px_fail(c->msg, c->msglen, st, "%s: cannot be formed from the basis: %s",
                    cd->sp->f.text, why);
    double nM = px_formula_count(&cd->sp->f, z);
    if (!(nM > 0)) return px_fail(c->msg, c->msglen, PX_EINVAL, "%s has no atom of the element", cd->sp->f.text);
    double dG = cd->G - nu[0] * c->G_h2o - nu[1] * c->G_h - nu[2] * c->G_e - nu[3] * G_ref -
                (lig ? nu[4] * lig->G : 0.0);
    const double ln10 = PX_LN10;
    /* Phi*nM = dG + RT ln a_j - sum_b nu_b RT ln a_b; ln a(H+) = -ln10 pH,
     * RT ln a(e-) = -F E, ln a(L) from the axis or fixed. */
    double kx[3] = {0, 0, 0}; /* coefficient per unit of pH, E, log a(L) */
    double c0 = dG;
    kx[PX_AXIS_PH] = nu[1] * c->RT * ln10;
    kx[PX_AXIS_E] = nu[2] * PX_F;
    if (cd->on_axis_activity) kx[PX_AXIS_LOGA] += c->RT * ln10; /* a_j itself is a(L) */
    else c0 += c->RT * cd->ln_a;
    if (lig) {
        if (lig->on_axis_activity) kx[PX_AXIS_LOGA] -= nu[4] * c->RT * ln10;
        else c0 -= nu[4] * c->RT * lig->ln_a;
    }
    /* axes not shown are fixed */
    for (int a = 0; a < 3; a++)
        if (a != (int)c->o->xaxis && a != (int)c->o->yaxis) c0 += kx[a] * axis_value(c, a);
    out->c = c0 / nM;
    out->p = kx[c->o->xaxis] / nM;
    out->q = kx[c->o->yaxis] / nM;
    out->id = (int)cd->db;
    out->label = cd->sp->f.text;
    if (!isfinite(out->c) || !isfinite(out->p) || !isfinite(out->q))
        return px_fail(c->msg, c->msglen, PX_ENONFINITE, "%s: non-finite Gibbs energy", cd->sp->f.text);
    return PX_OK;
}

/* Reaction between a and b per atom of z over the basis, as text with
 * integer coefficients and the electrons on the left. */
static void reaction_text(const ctx *c, const px_species *a, const px_species *b, int z,
                          const px_species *ref, const px_species *lig, char *buf, size_t n)
{
    px_formula fref = strip_group(c, &ref->f), flig = lig ? strip_group(c, &lig->f) : fref,
               fa = strip_group(c, &a->f), fb = strip_group(c, &b->f);
    const px_formula *basis[5] = {&c->h2o->f, &c->hplus->f, &c->elec->f, &fref, lig ? &flig : NULL};
    size_t nb = lig ? 5 : 4;
    double na[5], nbv[5];
    buf[0] = '\0';
    if (px_basis_formation(basis, nb, &fa, na, NULL, 0) != PX_OK ||
        px_basis_formation(basis, nb, &fb, nbv, NULL, 0) != PX_OK)
        return;
    double ma = px_formula_count(&a->f, z), mb = px_formula_count(&b->f, z);
    /* a/ma + sum d_i B_i = b/mb  with d = nu_b/mb - nu_a/ma */
    double coef[7];
    const char *name[7];
    int side[7]; /* -1 left, +1 right */
    int k = 0;
    coef[k] = 1.0 / ma, name[k] = a->f.text, side[k++] = -1;
    double d_e = 0;
    for (size_t i = 0; i < nb; i++) {
        double d = nbv[i] / mb - na[i] / ma;
        if (fabs(d) < PX_EMAP_COEF_EPS) continue;
        if (i == 3) continue; /* the element's reference cancels per atom */
        coef[k] = fabs(d);
        name[k] = basis[i]->text;
        side[k++] = d > 0 ? -1 : +1;
        if (i == 2) d_e = d;
    }
    coef[k] = 1.0 / mb, name[k] = b->f.text, side[k++] = +1;
    int flip = d_e < 0; /* electrons would be on the right: write the reduction */
    int scale = 1;
    for (; scale <= PX_EMAP_MAX_SCALE; scale++) {
        int ok = 1;
        for (int i = 0; i < k; i++)
            if (fabs(coef[i] * scale - round(coef[i] * scale)) > 1e-6) ok = 0;
        if (ok) break;
    }
    if (scale > PX_EMAP_MAX_SCALE) scale = 1;
    size_t used = 0;
    for (int pass = 0; pass < 2; pass++) {
        int want = (pass == 0) != flip ? -1 : +1;
        int first = 1;
        for (int q = 0; q < k; q++) {
            /* the two species of the boundary first, then the basis terms */
            int i = q == 0 ? (want < 0 ? 0 : k - 1) : q == 1 ? (want < 0 ? k - 1 : 0) : q - 1;
            if (side[i] != want) continue;
            double v = coef[i] * scale;
            char num[32] = "";
            if (fabs(v - round(v)) < 1e-6) {
                if (lround(v) != 1) snprintf(num, sizeof num, "%ld ", lround(v));
            } else {
                snprintf(num, sizeof num, "%.4g ", v);
            }
            int w = snprintf(buf + used, n - used, "%s%s%s", first ? "" : " + ", num, name[i]);
            if (w < 0 || (size_t)w >= n - used) return;
            used += (size_t)w;
            first = 0;
        }
        if (pass == 0) {
            int w = snprintf(buf + used, n - used, " = ");
            if (w < 0 || (size_t)w >= n - used) return;
            used += (size_t)w;
        }
    }
}

/* Candidates of element z (and optionally with ligand element zl). */
static int collect(const ctx *c, px_thermo_ws *ws, const px_db *db, int z, int zl, int other,
                   int for_ligand, cand **out, size_t *nout)
{
    size_t n = px_db_count(db), k = 0;
    cand *v = px_calloc(c->o->alloc, n ? n : 1, sizeof *v);
    if (!v) return PX_ENOMEM;
    const px_emap_options *o = c->o;
    double A = 0;
    if (o->ionic_strength > 0) {
        const px_water_state *w;
        int st = px_thermo_ws_water(ws, o->T, o->P, &w);
        if (st != PX_OK) {
            px_free(c->o->alloc, v);
            return px_fail(c->msg, c->msglen, st, "water at %.2f K, %.3g bar: %s", o->T, o->P, px_strerror(st));
        }
        A = w->A_gamma;
    }
    for (size_t i = 0; i < n; i++) {
        const px_species *sp = px_db_get(db, i);
        const px_formula *f = &sp->f;
        if (f->state == PX_STATE_E || px_formula_count(f, z) <= 0) continue;
        if (!made_of(f, z, zl, &c->lig)) continue;
        if (other && px_formula_count(f, other) > 0) continue;
        if (px_db_listed(db, o->exclude, o->n_exclude, (long)i)) continue;
        if (!px_ligand_allows(&c->ls, db, f, for_ligand ? other : z)) continue;
        if (!for_ligand && o->n_only > 0 && !px_db_listed(db, o->only, o->n_only, (long)i)) continue;
        cand *cd = &v[k];
        cd->db = (long)i;
        cd->sp = sp;
        int st = px_thermo_species_G(ws, db, sp, o->T, o->P, &cd->G);
        if (st != PX_OK) {
            px_free(c->o->alloc, v);
            return px_fail(c->msg, c->msglen, st, "%s at %.2f K, %.4g bar: %s", f->text, o->T, o->P,
                        px_thermo_ws_error(ws)[0] ? px_thermo_ws_error(ws) : px_strerror(st));
        }
        if (f->state == PX_STATE_AQ) {
            double a = for_ligand ? o->ligand_activity : o->activity;
            for (size_t q = 0; q < o->n_act; q++)
                if (px_db_listed(db, &o->act_species[q], 1, (long)i)) a = o->act_values[q];
            if (!(a > 0) || !isfinite(a)) {
                px_free(c->o->alloc, v);
                return px_fail(c->msg, c->msglen, PX_EINVAL, "%s: activity must be positive", f->text);
            }
            cd->ln_a = log(a) + PX_LN10 * px_equil_davies_log_gamma(A, f->charge, o->ionic_strength);
            cd->on_axis_activity = for_ligand && (o->xaxis == PX_AXIS_LOGA || o->yaxis == PX_AXIS_LOGA);
        } else if (f->state == PX_STATE_G) {
            cd->ln_a = PX_LN10 * o->gas_log_f;
        }
        k++;
    }
    *out = v;
    *nout = k;
    return PX_OK;
}

/* The element's reference form: among candidates without the ligand, the
 * one with the fewest atoms (any works: its terms are the same per atom for
 * every species). */
static const cand *reference(const cand *v, size_t n, int zl)
{
    const cand *best = NULL;
    double best_atoms = INFINITY;
    for (size_t i = 0; i < n; i++) {
        if (zl && px_formula_count(&v[i].sp->f, zl) > 0) continue;
        double atoms = 0;
        for (int e = 0; e < v[i].sp->f.n_elem; e++) atoms += v[i].sp->f.elem[e].n;
        if (atoms < best_atoms) {
            best_atoms = atoms;
            best = &v[i];
        }
    }
    return best;
}

static int basis_species(ctx *c, px_thermo_ws *ws, const px_db *db)
{
    c->h2o = px_db_find(db, "H2O(l)");
    c->hplus = px_db_find(db, "H^+");
    c->elec = px_db_find(db, "e-");
    if (!c->h2o || !c->hplus || !c->elec)
        return px_fail(c->msg, c->msglen, PX_ENOTFOUND, "the database lacks H2O(l), H^+ or e-");
    int st = px_thermo_species_G(ws, db, c->h2o, c->o->T, c->o->P, &c->G_h2o);
    if (st == PX_OK) st = px_thermo_species_G(ws, db, c->hplus, c->o->T, c->o->P, &c->G_h);
    if (st == PX_OK) st = px_thermo_species_G(ws, db, c->elec, c->o->T, c->o->P, &c->G_e);
    if (st != PX_OK)
        return px_fail(c->msg, c->msglen, st, "basis species at %.2f K: %s", c->o->T, px_thermo_ws_error(ws));
    return PX_OK;
}

static int water_lines(px_thermo_ws *ws, const px_db *db, px_emap *m, const px_emap_options *o)
{
    px_reaction r;
    int st = px_reaction_parse_balanced("O2(g) + 4 H^+ + 4 e- = 2 H2O(l)", &r, NULL, 0);
    px_reaction_result pr;
    if (st == PX_OK && px_db_find(db, "O2(g)")) {
        st = px_reaction_props(ws, db, &r, o->T, o->P, &pr);
        m->E0_o2 = st == PX_OK ? pr.E : NAN;
    } else {
        m->E0_o2 = NAN;
    }
    double logK;
    st = px_reaction_parse_balanced("H2O(l) = H^+ + OH^-", &r, NULL, 0);
    if (st == PX_OK && px_db_find(db, "OH^-") && px_reaction_logK(ws, db, &r, o->T, o->P, &logK) == PX_OK)
        m->pKw = -logK;
    else
        m->pKw = NAN;
    m->nernst_slope = PX_R * o->T * PX_LN10 / PX_F;
    return PX_OK;
}

#define Z_S 16
int px_emap_domain(const px_formula *f, int z)
{
    if (!f) return PX_DIAGRAM_CORROSION;
    if (f->state == PX_STATE_AQ || f->state == PX_STATE_G || f->state == PX_STATE_E) return PX_DIAGRAM_CORROSION;
    if (f->n_elem == 1 && f->elem[0].z == z) return PX_DIAGRAM_IMMUNITY;
    if (px_formula_count(f, Z_S) > 0 && px_formula_count(f, Z_O) == 0) return PX_DIAGRAM_SULFIDE_FILM;
    return PX_DIAGRAM_PASSIVATION;
}

/* The db indices of the candidates c[0..n) that no field of map shows: a
 * field's id is the candidate's db index, or (by_index) its index in c. */
static int never_shown(const px_allocator *a, const cand *c, size_t n, const px_diagram_map *map, int by_index,
                       long **out, size_t *nout)
{
    *out = px_calloc(a, n ? n : 1, sizeof **out);
    if (!*out) return PX_ENOMEM;
    for (size_t i = 0; i < n; i++) {
        long want = by_index ? (long)i : c[i].db;
        int shown = 0;
        for (size_t f = 0; f < map->nfield && !shown; f++) shown = map->field[f].id == want;
        if (!shown) (*out)[(*nout)++] = c[i].db;
    }
    return PX_OK;
}

/* Join the pieces of each species (same group) into outlines, and classify
 * the fields into corrosion domains (px_emap_domain). */
static int join_and_classify(px_emap *m, const px_db *db, int zM)
{
    const px_diagram_map *dm = m->map;
    size_t nf = dm->nfield;
    int *cls = px_alloc(m->alloc, (nf ? nf : 1) * sizeof *cls);
    if (!cls) return PX_ENOMEM;
    for (size_t f = 0; f < nf; f++) cls[f] = dm->field[f].group;
    int st = px_diagram_map_union(dm, cls, &m->joined);
    if (st == PX_OK) {
        static const int kind_of_domain[] = {PX_DIAGRAM_METAL, PX_DIAGRAM_SOLID, PX_DIAGRAM_DISSOLVED,
                                             PX_DIAGRAM_SULFIDE};
        for (size_t f = 0; f < nf; f++)
            cls[f] = kind_of_domain[px_emap_domain(&px_db_get(db, (size_t)m->info[f].species)->f, zM)];
        st = px_diagram_corrosion_domains(dm, cls, &m->domains);
    }
    px_free(m->alloc, cls);
    if (st != PX_OK) return st;
    const px_diagram_outlines *u = m->joined;
    m->outline = px_calloc(m->alloc, u->nloop ? u->nloop : 1, sizeof *m->outline);
    if (!m->outline) return PX_ENOMEM;
    for (size_t i = 0; i < u->nloop; i++) {
        const px_diagram_loop *lp = &u->loop[i];
        if (!(lp->area > 0)) continue; /* holes are subtracted from their outline */
        px_emap_outline *o = &m->outline[m->n_outline++];
        o->piece = lp->cls;
        o->first = lp->first;
        o->n = lp->n;
        o->area = lp->area;
        for (size_t h = 0; h < u->nloop; h++) {
            const px_diagram_loop *hl = &u->loop[h];
            if (hl->area < 0 && hl->cls == lp->cls &&
                px_geom_polygon_contains(u->x + lp->first, u->y + lp->first, lp->n,
                                         u->x[hl->first], u->y[hl->first]))
                o->area += hl->area;
        }
    }
    return PX_OK;
}

void px_emap_free(px_emap *m)
{
    if (!m) return;
    const px_allocator *a = m->alloc;
    px_diagram_map_free(m->map);
    px_diagram_map_free(m->ligand_map);
    px_diagram_outlines_free(m->joined);
    px_diagram_outlines_free(m->domains);
    px_free(m->alloc, m->outline);
    px_free(m->alloc, m->info);
    px_free(m->alloc, m->bnd);
    px_free(m->alloc, m->ligand_species);
    px_free(m->alloc, m->absent);
    px_free(m->alloc, m->ligand_absent);
    px_free(a, m);
}

int px_emap_build(px_thermo_ws *ws, const px_db *db, const char *element,
                  const px_emap_options *opt, px_emap **out, char *msg, size_t msglen)
{
    if (!ws || !db || !element || !opt || !out) return PX_EINVAL;
    *out = NULL;
    if (msg && msglen) msg[0] = '\0';
    const px_emap_options *o = opt;
    if (!(isfinite(o->T) && isfinite(o->P)) || o->xaxis == o->yaxis || o->xaxis > PX_AXIS_LOGA ||
        o->yaxis > PX_AXIS_LOGA)
        return px_fail(msg, msglen, PX_EINVAL, "bad temperature, pressure or axes");
    int zM = px_element_z(element);
    ligand_group lg;
    memset(&lg, 0, sizeof lg);
    if (!zM || zM == Z_H || zM == Z_O) return px_fail(msg, msglen, PX_EINVAL, "unknown element '%s'", element);
    int bad_lig = o->ligand && ligand_parse(o->ligand, &lg) != PX_OK;
    for (int k = 0; !bad_lig && k < lg.n_extra; k++) bad_lig = lg.extra[k] == zM;
    if (bad_lig || (o->ligand && lg.z == zM))
        return px_fail(msg, msglen, PX_EINVAL,
                       "bad ligand '%s' (an element symbol such as \"Cl\", or a group such as \"CN\")", o->ligand);
    int zL = lg.z;
    if ((o->xaxis == PX_AXIS_LOGA || o->yaxis == PX_AXIS_LOGA) && !zL)
        return px_fail(msg, msglen, PX_EINVAL, "a log a(L) axis needs a ligand element");

    /* every named species must exist: a misspelt exclude is an error, not a no-op */
    int st = px_db_check_list(db, "exclude", o->exclude, o->n_exclude, msg, msglen);
    if (st == PX_OK) st = px_db_check_list(db, "only", o->only, o->n_only, msg, msglen);
    if (st == PX_OK) st = px_db_check_list(db, "activities", o->act_species, o->n_act, msg, msglen);
    if (st != PX_OK) return st;
    /* a ligand group keeps its own form (cyanide stays cyanide): it replaces
     * the oxidation-state rules of its elements (C as carbonate, N as
     * ammonia), which would otherwise exclude every species of the group */
    px_ligand_states ls = o->ligands;
    if (lg.n_extra > 0) {
        size_t kept = 0;
        for (size_t i = 0; i < ls.n; i++) {
            int in_group = ls.rule[i].z == lg.z;
            for (int k = 0; k < lg.n_extra; k++) in_group |= ls.rule[i].z == lg.extra[k];
            if (!in_group) ls.rule[kept++] = ls.rule[i];
        }
        ls.n = kept;
    }
    ctx c = {o, PX_R * o->T, o->T, 0, 0, 0, NULL, NULL, NULL, lg, ls, msg, msglen};
    st = basis_species(&c, ws, db);
    if (st != PX_OK) return st;

    px_emap *m = px_calloc(o->alloc, 1, sizeof *m);
    if (!m) return PX_ENOMEM;
    m->alloc = o->alloc;
    cand *cm = NULL, *cl = NULL;
    size_t ncm = 0, ncl = 0;
    px_diagram_species *phi = NULL;
    px_diagram_region *reg = NULL;
    const cand **lig_of_region = NULL;
    size_t nreg = 0;
    px_diagram_options dopt = px_diagram_options_default();
    dopt.alloc = o->alloc;

    st = collect(&c, ws, db, zM, zL, 0, 0, &cm, &ncm);
    if (st != PX_OK) goto done;
    if (ncm == 0) {
        st = px_fail(msg, msglen, PX_ENOTFOUND, "no species of %s in the loaded data", element);
        goto done;
    }
    const cand *refM = reference(cm, ncm, zL);
    if (!refM) {
        st = px_fail(msg, msglen, PX_ENOTFOUND, "no species of %s without the ligand", element);
        goto done;
    }
    m->n_candidates = ncm;

    if (zL) { /* the ligand's own map first */
        st = collect(&c, ws, db, zL, 0, zM, 1, &cl, &ncl);
        if (st != PX_OK) goto done;
        if (ncl == 0) {
            st = px_fail(msg, msglen, PX_ENOTFOUND, "no species of the ligand %s", o->ligand);
            goto done;
        }
        const cand *refL = reference(cl, ncl, 0);
        px_diagram_species *lphi = px_calloc(o->alloc, ncl, sizeof *lphi);
        if (!lphi) {
            st = PX_ENOMEM;
            goto done;
        }
        for (size_t i = 0; i < ncl && st == PX_OK; i++) {
            st = phi_of(&c, &cl[i], zL, refL->sp, refL->G, NULL, &lphi[i]);
            lphi[i].id = (int)i; /* index into cl */
        }
        if (st == PX_OK) st = px_diagram_map_exact(&o->window, lphi, ncl, &dopt, &m->ligand_map);
        px_free(o->alloc, lphi);
        if (st != PX_OK) goto done;
        nreg = m->ligand_map->nfield;
        m->ligand_species = px_calloc(o->alloc, nreg ? nreg : 1, sizeof *m->ligand_species);
        reg = px_calloc(o->alloc, nreg ? nreg : 1, sizeof *reg);
        lig_of_region = px_calloc(o->alloc, nreg ? nreg : 1, sizeof *lig_of_region);
        phi = px_calloc(o->alloc, nreg * ncm + 1, sizeof *phi);
        if (!m->ligand_species || !reg || !lig_of_region || !phi) {
            st = PX_ENOMEM;
            goto done;
        }
    } else {
        nreg = 1;
        reg = px_calloc(o->alloc, 1, sizeof *reg);
        lig_of_region = px_calloc(o->alloc, 1, sizeof *lig_of_region);
        phi = px_calloc(o->alloc, ncm, sizeof *phi);
        if (!reg || !lig_of_region || !phi) {
            st = PX_ENOMEM;
            goto done;
        }
    }

    /* region polygons: the ligand fields, or the window */
    double winx[4] = {o->window.xmin, o->window.xmax, o->window.xmax, o->window.xmin};
    double winy[4] = {o->window.ymin, o->window.ymin, o->window.ymax, o->window.ymax};
    double *rx = NULL, *ry = NULL;
    if (zL) {
        size_t tot = m->ligand_map->nring;
        rx = px_alloc(o->alloc, (tot ? tot : 1) * sizeof *rx);
        ry = px_alloc(o->alloc, (tot ? tot : 1) * sizeof *ry);
        if (!rx || !ry) {
            px_free(o->alloc, rx);
            px_free(o->alloc, ry);
            st = PX_ENOMEM;
            goto done;
        }
    }
    for (size_t r = 0; r < nreg && st == PX_OK; r++) {
        const cand *lig = NULL;
        if (zL) {
            const px_diagram_field *lf = &m->ligand_map->field[r];
            lig = &cl[lf->id];
            m->ligand_species[r] = lig->db;
            for (size_t k = 0; k < lf->n; k++) {
                size_t vi = m->ligand_map->ring[lf->first + k];
                rx[lf->first + k] = m->ligand_map->vx[vi];
                ry[lf->first + k] = m->ligand_map->vy[vi];
            }
            reg[r].x = rx + lf->first;
            reg[r].y = ry + lf->first;
            reg[r].n = lf->n;
        } else {
            reg[r].x = winx;
            reg[r].y = winy;
            reg[r].n = 4;
        }
        lig_of_region[r] = lig;
        px_diagram_species *ph = phi + r * ncm;
        for (size_t i = 0; i < ncm && st == PX_OK; i++)
            st = phi_of(&c, &cm[i], zM, refM->sp, refM->G, lig, &ph[i]);
        reg[r].sp = ph;
        reg[r].m = ncm;
        reg[r].id = (int)r;
    }
    if (st == PX_OK) st = px_diagram_map_nested(reg, nreg, &dopt, &m->map);
    px_free(o->alloc, rx);
    px_free(o->alloc, ry);
    if (st != PX_OK) {
        if (msg && msglen && !msg[0]) snprintf(msg, msglen, "map of %s: %s", element, px_strerror(st));
        goto done;
    }

    /* fields: species, ligand, kind */
    m->info = px_calloc(o->alloc, m->map->nfield ? m->map->nfield : 1, sizeof *m->info);
    m->bnd = px_calloc(o->alloc, m->map->nboundary ? m->map->nboundary : 1, sizeof *m->bnd);
    if (!m->info || !m->bnd) {
        st = PX_ENOMEM;
        goto done;
    }
    for (size_t f = 0; f < m->map->nfield; f++) {
        const px_diagram_field *df = &m->map->field[f];
        const px_species *sp = px_db_get(db, (size_t)df->id);
        m->info[f].species = df->id;
        m->info[f].ligand = zL ? m->ligand_species[df->region] : -1;
        m->info[f].kind = kind_of(&sp->f, zM);
    }
    for (size_t b = 0; b < m->map->nboundary; b++) {
        const px_diagram_boundary *db_ = &m->map->boundary[b];
        m->bnd[b].a = db_->id_a;
        m->bnd[b].b = db_->id_b;
        const px_diagram_field *fa = &m->map->field[db_->field_a];
        const cand *lig = lig_of_region[fa->region];
        reaction_text(&c, px_db_get(db, (size_t)db_->id_a), px_db_get(db, (size_t)db_->id_b), zM,
                      refM->sp, lig ? lig->sp : NULL, m->bnd[b].reaction, sizeof m->bnd[b].reaction);
    }
    /* candidates never shown: the element's (its fields carry db indices)
     * and the ligand's in its own map (its fields carry indices into cl) */
    st = never_shown(o->alloc, cm, ncm, m->map, 0, &m->absent, &m->n_absent);
    if (st == PX_OK && zL) st = never_shown(o->alloc, cl, ncl, m->ligand_map, 1, &m->ligand_absent, &m->n_ligand_absent);
    if (st != PX_OK) goto done;
    water_lines(ws, db, m, o);
    st = join_and_classify(m, db, zM);
    if (st != PX_OK) px_fail(msg, msglen, st, "map of %s: joining fields: %s", element, px_strerror(st));

done:
    px_free(o->alloc, cm);
    px_free(o->alloc, cl);
    px_free(o->alloc, phi);
    px_free(o->alloc, reg);
    px_free(o->alloc, lig_of_region);
    if (st != PX_OK) {
        px_emap_free(m);
        return st;
    }
    *out = m;
    return PX_OK;
}
