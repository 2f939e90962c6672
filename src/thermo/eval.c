/* eval.c - standard Gibbs energies and other properties of every species at
 * (T, P), and the properties of reactions built from them.
 *
 * The caller owns a px_thermo_ws: it caches the water state at the last
 * (T, P) (one IAPWS-95 density solve and the dielectric constant), the
 * reference state at 298.15 K, 1 bar, the g-function and the HKF terms
 * common to all species at both, and the parsed reactions of reaction-
 * defined species (checked against the record before each use).  The G of
 * each species is memoised within one call only (dependencies of reaction-
 * defined species), since a database may be freed between calls.
 * Evaluating a whole database at a new (T, P) therefore costs one water
 * solve plus a few arithmetic operations per species.
 *
 * Models (species.h): HKF (hkf.c), CP (cpmodel.c), LOGK (a species defined by
 * its formation reaction: nu_s G_s = -sum_{j != s} nu_j G_j - RT ln10 log K,
 * resolved recursively in the database with cycle detection), WATER (IAPWS-95
 * anchored at the NBS 1982 values: G - G_r = [g - g_r] - (S_3rd - s_r)(T - Tr),
 * g and s molar IAPWS-95 values).  The electron: e- = H^+ - 1/2 H2(g)
 * (DESIGN.md), so potentials are against the SHE at the same T and P. */
#include "core/alloc.h"
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"
#include "thermo/thermo_internal.h"

#define MAX_LOGK_DEPTH 16  /* nesting of reaction-defined species */
#define D2RHO_STEP 0.05    /* K, central difference of drho/dT for g_TT */

/* A LOGK species' reaction, parsed once, with the db index of each species
 * (-1: the electron, or the species itself). */
typedef struct logk_cache {
    char text[PX_NAME_MAX]; /* the species and reaction it was built from: a */
    char reaction[256];     /* cache entry is used only if both still match */
    px_reaction r;
    int self;
    long idx[PX_REACTION_MAX];
    char model_text[256]; /* isocoulombic model reaction (px_logk_params.model) */
    px_reaction model;    /* parsed; model.n = 0 if none */
} logk_cache;

struct px_thermo_ws {
    px_dielectric_model model;
    /* reference state (lazy) */
    int have_ref;
    px_water_state wr;
    px_hkf_gfun gr;
    /* water at the cached (T, P) */
    int have_w;
    double wT, wP;
    px_water_state w;
    px_hkf_gfun g;
    int have_common; /* HKF terms shared by all species at (wT, wP) */
    px__hkf_common hc;
    /* parsed reactions of LOGK species, per db index (valid for lk_db/lk_gen) */
    const px_db *lk_db;
    unsigned long lk_gen;
    struct logk_cache **lk;
    size_t lk_n;
    /* species G memo, valid within one top-level call */
    const px_db *cdb;
    unsigned long cgen;
    double cT, cP;
    double *Gc;
    unsigned char *Gok;
    size_t ccap;
    /* recursion stack for LOGK species */
    const px_species *stack[MAX_LOGK_DEPTH];
    int depth;
    char err[256];
};

static int werr(px_thermo_ws *ws, int st, const char *fmt, ...)
{
    va_list ap;
    va_start(ap, fmt);
    vsnprintf(ws->err, sizeof ws->err, fmt, ap);
    va_end(ap);
    return st;
}

px_thermo_ws *px_thermo_ws_new(px_dielectric_model m)
{
    px_thermo_ws *ws = px_calloc(NULL, 1, sizeof *ws);
    if (ws)
        ws->model = m;
    return ws;
}

void px_thermo_ws_free(px_thermo_ws *ws)
{
    if (!ws)
        return;
    for (size_t i = 0; i < ws->lk_n; i++)
        px_free(NULL, ws->lk[i]);
    px_free(NULL, ws->lk);
    px_free(NULL, ws->Gc);
    px_free(NULL, ws->Gok);
    px_free(NULL, ws);
}

const char *px_thermo_ws_error(const px_thermo_ws *ws) { return ws ? ws->err : ""; }

static int ensure_ref(px_thermo_ws *ws)
{
    if (ws->have_ref)
        return PX_OK;
    int st = px_water_state_eval(PX_TR, PX_PR, ws->model, &ws->wr);
    if (st)
        return werr(ws, st, "water at 298.15 K, 1 bar: %s", px_strerror(st));
    px_hkf_gfunction(&ws->wr, 0, &ws->gr);
    ws->have_ref = 1;
    return PX_OK;
}

int px_thermo_ws_water(px_thermo_ws *ws, double T, double P, const px_water_state **w)
{
    if (!ws || !w)
        return PX_EINVAL;
    if (!(isfinite(T) && isfinite(P)))
        return werr(ws, PX_EINVAL, "non-finite T or P");
    if (!ws->have_w || ws->wT != T || ws->wP != P) {
        ws->have_w = 0;
        ws->have_common = 0;
        int st = px_water_state_eval(T, P, ws->model, &ws->w);
        if (st)
            return werr(ws, st, "water at %.2f K, %.4g bar: %s", T, P, px_strerror(st));
        px_hkf_gfunction(&ws->w, 0, &ws->g);
        ws->wT = T;
        ws->wP = P;
        ws->have_w = 1;
    }
    *w = &ws->w;
    return PX_OK;
}

/* d2rho/dT2 at (T, P) by a central difference of drho/dT (the water API has
 * no second derivative); needed only for Cp through g_TT. */
static double d2rho_dT2(px_thermo_ws *ws, double T, double P)
{
    px_water_state a, b;
    double h = D2RHO_STEP;
    double lo = T - h, hi = T + h;
    if (lo < PX_WATER_TMIN)
        lo = T;
    if (hi > PX_WATER_TMAX)
        hi = T;
    if (hi == lo)
        return 0;
    if (px_water_state_eval(lo, P, ws->model, &a) || px_water_state_eval(hi, P, ws->model, &b))
        return 0;
    return (b.drho_dT - a.drho_dT) / (hi - lo);
}

static int water_pair(px_thermo_ws *ws, double T, double P, const px_water_state **w)
{
    int st = ensure_ref(ws);
    if (st)
        return st;
    st = px_thermo_ws_water(ws, T, P, w);
    if (st)
        return st;
    if (!ws->have_common) {
        px__hkf_common_init(&ws->w, &ws->wr, &ws->g, &ws->gr, &ws->hc);
        ws->have_common = 1;
    }
    return PX_OK;
}

/* ---- log K models ---- */
static void logk_reaction(const px_logk_params *lk, double T, double *dG, double *dH,
                          double *dS, double *dCp)
{
    const double RL = PX_R * PX_LN10;
    if (lk->analytic) {
        const double *k = lk->k;
        /* log K = k0 + k1 T + k2/T + k3 log10 T + k4/T^2 */
        double lg = k[0] + k[1] * T + k[2] / T + k[3] * log10(T) + k[4] / (T * T);
        double dlg = k[1] - k[2] / (T * T) + k[3] / (T * PX_LN10) - 2 * k[4] / (T * T * T);
        *dG = -RL * T * lg;
        *dH = RL * T * T * dlg; /* van 't Hoff: dH = R ln10 T^2 dlogK/dT */
        *dS = (*dH - *dG) / T;
        /* dCp = d(dH)/dT, dH = RL (k1 T^2 - k2 + k3 T/ln10 - 2 k4/T) */
        *dCp = RL * (2 * k[1] * T + k[3] / PX_LN10 + 2 * k[4] / (T * T));
    } else {
        double h = isfinite(lk->dH) ? lk->dH : 0.0;
        double cp = isfinite(lk->dH) ? lk->dCp : 0.0;
        /* Kirchhoff with constant dCp (van 't Hoff when dCp = 0):
         * dH(T) = dH(Tr) + dCp (T - Tr), dS(T) = dS(Tr) + dCp ln(T/Tr), dG = dH - T dS */
        double g0 = -RL * PX_TR * lk->logK25;
        double s0 = (h - g0) / PX_TR;
        *dH = h + cp * (T - PX_TR);
        *dS = s0 + cp * log(T / PX_TR);
        *dG = *dH - T * *dS;
        *dCp = cp;
    }
}

/* ---- per-species evaluation ---- */
static int species_G(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                     double P, double *G);
static int species_props(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                         double P, px_thermo_props *out);
static int is_iso(const px_species *sp);
static int logk_find_self(px_thermo_ws *ws, const px_species *sp, px_reaction *r, int *self);
static int push(px_thermo_ws *ws, const px_species *sp);

static int cache_prepare(px_thermo_ws *ws, const px_db *db, double T, double P)
{
    size_t n = px_db_count(db);
    if (ws->cdb == db && ws->cgen == px__db_generation(db) && ws->cT == T && ws->cP == P &&
        ws->ccap >= n)
        return PX_OK;
    if (ws->ccap < n) {
        size_t cap = n < 64 ? 64 : n;
        double *g = px_realloc(NULL, ws->Gc, ws->ccap * sizeof *g, cap * sizeof *g);
        if (!g)
            return PX_ENOMEM;
        ws->Gc = g;
        unsigned char *ok = px_realloc(NULL, ws->Gok, ws->ccap, cap);
        if (!ok)
            return PX_ENOMEM;
        ws->Gok = ok;
        ws->ccap = cap;
    }
    memset(ws->Gok, 0, ws->ccap);
    ws->cdb = db;
    ws->cgen = px__db_generation(db);
    ws->cT = T;
    ws->cP = P;
    return PX_OK;
}

static int electron_G(px_thermo_ws *ws, const px_db *db, double T, double P, double *G)
{
    const px_species *h2 = px_db_find(db, "H2(g)");
    if (!h2)
        return werr(ws, PX_ENOTFOUND,
                    "e-: the electron convention e- = H^+ - 1/2 H2(g) needs H2(g) in the database");
    double g;
    int st = species_G(ws, db, h2, T, P, &g);
    if (st)
        return st;
    /* H^+ + e- = 1/2 H2(g) has dG = 0 at every T, P (the SHE): G(e-) = G(H2)/2 - G(H^+),
     * and G(H^+) = 0 by the conventional ionic standard state */
    *G = 0.5 * g;
    return PX_OK;
}

/* ---- the isocoulombic estimate (Gu, Gammons and Bloom 1994, GCA 58, 3545) ---- */

/* total positive ionic charge, products minus reactants; an electron counts
 * as -1 H^+ (e- = 1/2 H2(g) - H^+) */
static double positive_charge(const px_reaction *r)
{
    double pos = 0;
    for (int i = 0; i < r->n; i++) {
        if (r->sp[i].state == PX_STATE_E)
            pos -= r->nu[i];
        else if (r->sp[i].charge > 0)
            pos += r->nu[i] * r->sp[i].charge;
    }
    return pos;
}

int px_reaction_isocoulombic_n(const px_reaction *r, double *n)
{
    if (!r || !n)
        return PX_EINVAL;
    double pos = positive_charge(r);
    /* H2O(l) = H^+ + OH^- adds one positive charge per unit: R + n W balances */
    *n = pos == 0 ? 0 : -pos;
    return PX_OK;
}

/* G of sp at Tr, Pr from its dfG, or for a reaction-defined species from its
 * record's dG at Tr and its reaction partners' G at Tr, Pr; no evaluation at
 * another T (the G cache of ws holds one T, P at a time). */
static int species_G_ref(px_thermo_ws *ws, const px_db *db, const char *who, const px_formula *f,
                         double *G)
{
    if (f->state == PX_STATE_E) { /* as electron_G: G(e-) = G(H2,g)/2 */
        px_formula h2;
        memset(&h2, 0, sizeof h2);
        snprintf(h2.text, sizeof h2.text, "%s", "H2(g)");
        double g;
        int st = species_G_ref(ws, db, who, &h2, &g);
        *G = 0.5 * g;
        return st;
    }
    const px_species *sp = db ? px_db_find(db, f->text) : NULL;
    if (!sp)
        return werr(ws, PX_ENOTFOUND, "%s: the isocoulombic estimate needs %s in the database",
                    who, f->text);
    if (isfinite(sp->dGf)) {
        *G = sp->dGf;
        return PX_OK;
    }
    if (sp->model != PX_MODEL_LOGK)
        return werr(ws, PX_EDATA, "%s: the isocoulombic estimate needs dfG of %s at 25 C", who,
                    f->text);
    px_reaction r;
    int self = -1; /* set by logk_find_self on success */
    int st = logk_find_self(ws, sp, &r, &self);
    if (!st)
        st = push(ws, sp);
    if (st)
        return st;
    double sum = 0;
    for (int i = 0; i < r.n && !st; i++) {
        double g = 0;
        if (i != self)
            st = species_G_ref(ws, db, who, &r.sp[i], &g);
        sum += r.nu[i] * g;
    }
    ws->depth--;
    if (st)
        return st;
    double dG, dH, dS, dCp;
    if (is_iso(sp)) /* every isocoulombic form keeps its 25 C log K at Tr */
        dG = -PX_R * PX_TR * PX_LN10 * sp->logk.logK25;
    else
        logk_reaction(&sp->logk, PX_TR, &dG, &dH, &dS, &dCp);
    *G = (dG - sum) / r.nu[self];
    return PX_OK;
}

/* Reaction m at (T, P): dG (and with full, dH, dS, dCp, dV) in p, and its dG
 * at Tr, Pr in *dGref.  m is the water ionisation or a model reaction. */
static int combo_reaction(px_thermo_ws *ws, const px_db *db, const char *who,
                          const px_reaction *m, double T, double P, int full, px_thermo_props *p,
                          double *dGref)
{
    memset(p, 0, sizeof *p);
    *dGref = 0;
    for (int i = 0; i < m->n; i++) {
        double gref;
        int st = species_G_ref(ws, db, who, &m->sp[i], &gref);
        if (st)
            return st;
        *dGref += m->nu[i] * gref;
        const px_species *s = NULL;
        px_species tmp;
        if (m->sp[i].state == PX_STATE_E) {
            px_species_init(&tmp);
            tmp.f = m->sp[i];
            s = &tmp;
        } else {
            s = px_db_find(db, m->sp[i].text); /* found: species_G_ref succeeded */
        }
        if (full) {
            px_thermo_props q;
            st = species_props(ws, db, s, T, P, &q);
            p->H += m->nu[i] * q.H;
            p->S += m->nu[i] * q.S;
            p->Cp += m->nu[i] * q.Cp;
            p->V += m->nu[i] * q.V;
            p->G += m->nu[i] * q.G;
        } else {
            double g = 0;
            st = species_G(ws, db, s, T, P, &g);
            p->G += m->nu[i] * g;
        }
        if (st)
            return st;
    }
    return PX_OK;
}

/* The species a model reaction's dG(T) rests on, with net coefficients: each
 * logk species with measured data (dH or log K(T)) is replaced by the other
 * species of its formation reaction, recursively, since its G(T) is theirs
 * plus a measured log K.  What is left must cancel or be measured itself:
 * in Sr^2+ + SO4^2- = SrSO4(aq) the ion cancels, so the model's dG(T) is the
 * measured log K(T) of the ion pair whatever the ion's own basis. */
#define MODEL_TERMS 48          /* distinct species after expansion */
#define MODEL_DEPTH 8           /* nesting of expanded logk species */
#define MODEL_CANCEL_TOL 1e-9   /* |net coefficient| below this cancels (rounding of 1/nu) */
typedef struct model_term {
    const px_species *sp;
    double c;
} model_term;

static int model_expand(px_thermo_ws *ws, const px_db *db, const char *who, const px_reaction *r,
                        double scale, const px_species *skip, model_term *t, int *nt, int depth)
{
    for (int i = 0; i < r->n; i++) {
        if (r->sp[i].state == PX_STATE_E)
            continue; /* the electron carries no G */
        const px_species *o = px_db_find(db, r->sp[i].text);
        if (!o || o == skip)
            continue; /* a missing species is reported by combo_reaction */
        double c = scale * r->nu[i];
        if (o->model == PX_MODEL_LOGK && px_species_tbasis(o, NULL) == PX_TBASIS_MEASURED &&
            depth < MODEL_DEPTH) {
            px_reaction fr; /* local: workers of one process share this code */
            if (px_reaction_parse(o->logk.reaction, &fr, NULL, 0) != PX_OK)
                return werr(ws, PX_EDATA, "%s: reaction of %s does not parse", who, o->f.text);
            double self = 0;
            for (int k = 0; k < fr.n; k++)
                if (px_db_find(db, fr.sp[k].text) == o)
                    self = fr.nu[k];
            if (self != 0) {
                int st = model_expand(ws, db, who, &fr, -c / self, o, t, nt, depth + 1);
                if (st)
                    return st;
                continue;
            }
        }
        int k = 0;
        while (k < *nt && t[k].sp != o)
            k++;
        if (k == *nt) {
            if (*nt >= MODEL_TERMS)
                return werr(ws, PX_ELIMIT, "%s: model reaction rests on more than %d species", who,
                            MODEL_TERMS);
            t[(*nt)++] = (model_term){o, 0};
        }
        t[k].c += c;
    }
    return PX_OK;
}

/* PX_OK if every species model's dG(T) rests on (after model_expand) has
 * measured temperature data, else PX_EDATA naming the first that has not */
static int model_measured(px_thermo_ws *ws, const px_db *db, const char *who,
                          const px_reaction *model, const char *what)
{
    model_term terms[MODEL_TERMS];
    int nt = 0;
    int st = model_expand(ws, db, who, model, 1.0, NULL, terms, &nt, 0);
    for (int i = 0; !st && i < nt; i++)
        if (fabs(terms[i].c) > MODEL_CANCEL_TOL &&
            px_species_tbasis(terms[i].sp, NULL) != PX_TBASIS_MEASURED)
            st = werr(ws, PX_EDATA, "%s: %s: %s has no measured temperature data (%s)", who, what,
                      terms[i].sp->f.text, px_tbasis_name(px_species_tbasis(terms[i].sp, NULL)));
    return st;
}

/* reaction dG, dH, dS, dCp by the isocoulombic estimate (px_isocoulombic_logK);
 * model (may be NULL): a reaction with measured data subtracted from r first
 * (the model-reaction form of the method, Lindsay 1980; Gu et al. 1994) */
static int iso_reaction(px_thermo_ws *ws, const px_db *db, const char *who,
                        const px_reaction *r, const px_reaction *model, double logK25, double T,
                        double P, int full, double *dG, double *dH, double *dS, double *dCp,
                        double *dV)
{
    /* R' = R - M + n W, n water ionisations W: H2O(l) = H^+ + OH^- */
    double pos = positive_charge(r) - (model ? positive_charge(model) : 0);
    double n = pos == 0 ? 0 : -pos;
    double dG0 = -PX_R * PX_TR * PX_LN10 * logK25;
    px_thermo_props w = {0, 0, 0, 0, 0}, mp = {0, 0, 0, 0, 0};
    double wref = 0, mref = 0;
    int st = PX_OK;
    if (n != 0) {
        px_reaction water; /* local: workers of one process share this code */
        if (px_reaction_parse("H2O(l) = H^+ + OH^-", &water, NULL, 0) != PX_OK)
            return werr(ws, PX_EDATA, "%s: water ionisation does not parse", who);
        st = combo_reaction(ws, db, who, &water, T, P, full, &w, &wref);
    }
    if (!st && model && db) /* a model carries measured data */
        st = model_measured(ws, db, who, model, "isocoulombic model reaction");
    if (!st && model)
        st = combo_reaction(ws, db, who, model, T, P, full, &mp, &mref);
    if (st)
        return st;
    /* dG(R') = dH(R') = dG_R(Tr) - dG_M(Tr) + n dG_W(Tr), dS(R') = dCp(R') = 0 */
    double iso = dG0 - mref + n * wref;
    *dG = iso + mp.G - n * w.G;
    *dH = iso + mp.H - n * w.H;
    *dS = mp.S - n * w.S;
    *dCp = mp.Cp - n * w.Cp;
    *dV = mp.V - n * w.V; /* dG(R') is taken independent of P too */
    return PX_OK;
}

/* A reaction with a measured dH at Tr whose dCp(T) is that of a model
 * reaction M with measured data: R - M is isocoulombic and its dCp is taken
 * as 0 at every T (the model-substance form of the isocoulombic method,
 * Lindsay 1980), while R keeps its own dH and dS at Tr (docs/thermo.md):
 *   dH(T) = dH_R(Tr) + [dH_M(T) - dH_M(Tr)],  dS(T) = dS_R(Tr) + [dS_M(T) - dS_M(Tr)]
 *   dG(T) = dG_R(Tr) - dS_R(Tr)(T - Tr) + [dG_M(T) - dG_M(Tr) + dS_M(Tr)(T - Tr)]
 * Without full only dG is set (the others 0). */
static int iso_cp_reaction(px_thermo_ws *ws, const px_db *db, const char *who,
                           const px_logk_params *lk, const px_reaction *r,
                           const px_reaction *model, double T, double P, int full, double *dG,
                           double *dH, double *dS, double *dCp, double *dV)
{
    if (!db || !model || model->n == 0)
        return werr(ws, PX_EDATA, "%s: an isocoulombic dCp needs its model reaction and a database",
                    who);
    if (positive_charge(r) != positive_charge(model))
        return werr(ws, PX_EDATA,
                    "%s: the model reaction of an isocoulombic dCp must carry the same ionic charge "
                    "(reaction minus model isocoulombic): %s vs %s",
                    who, lk->reaction, lk->model);
    int st = model_measured(ws, db, who, model, "isocoulombic dCp model reaction");
    px_thermo_props m0, mt;
    double gref;
    if (!st) /* the model at Tr, Pr (full properties: H and S) */
        st = combo_reaction(ws, db, who, model, PX_TR, PX_PR, 1, &m0, &gref);
    if (!st)
        st = combo_reaction(ws, db, who, model, T, P, full, &mt, &gref);
    if (st)
        return st;
    double g0, h0, s0, cp0;
    logk_reaction(lk, PX_TR, &g0, &h0, &s0, &cp0); /* R at Tr (its dCp is 0) */
    if (full) {
        *dH = h0 + (mt.H - m0.H);
        *dS = s0 + (mt.S - m0.S);
        *dG = *dH - T * *dS;
        *dCp = mt.Cp;
        *dV = mt.V;
    } else {
        *dG = g0 - s0 * (T - PX_TR) + (mt.G - m0.G + m0.S * (T - PX_TR));
        *dH = *dS = *dCp = *dV = 0.0;
    }
    return PX_OK;
}

static int is_iso_cp(const px_species *sp)
{
    return sp->logk.cp_estimate == PX_LOGK_CP_EST_ISOCOULOMBIC && !sp->logk.analytic &&
           isfinite(sp->logk.dH);
}

int px_isocoulombic_logK(px_thermo_ws *ws, const px_db *db, const px_reaction *r, double logK25,
                         double T, double P, double *logK)
{
    if (!ws || !r || !logK)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL;
    if (!(T > 0) || !isfinite(P) || !isfinite(logK25))
        return werr(ws, PX_EINVAL, "T, P and log K must be finite, T positive");
    double dG, dH, dS, dCp, dV;
    int st = iso_reaction(ws, db, "isocoulombic", r, NULL, logK25, T, P, 0, &dG, &dH, &dS, &dCp,
                          &dV);
    if (st)
        return st;
    *logK = -dG / (PX_R * T * PX_LN10);
    return PX_OK;
}

static int is_iso(const px_species *sp)
{
    return sp->logk.estimate == PX_LOGK_EST_ISOCOULOMBIC && !sp->logk.analytic &&
           !isfinite(sp->logk.dH);
}

static int logk_find_self(px_thermo_ws *ws, const px_species *sp, px_reaction *r, int *self)
{
    char msg[256];
    int st = px_reaction_parse(sp->logk.reaction, r, msg, sizeof msg);
    if (st)
        return werr(ws, st, "%s: reaction: %s", sp->f.text, msg);
    *self = -1;
    for (int i = 0; i < r->n; i++)
        if (!strcmp(r->sp[i].text, sp->f.text))
            *self = i;
    if (*self < 0)
        return werr(ws, PX_EDATA, "%s: the species is not in its reaction '%s'", sp->f.text,
                    sp->logk.reaction);
    return PX_OK;
}

/* the parsed isocoulombic model reaction of sp; m->n = 0 if it has none */
static int model_parse(px_thermo_ws *ws, const px_species *sp, px_reaction *m)
{
    m->n = 0;
    if ((!is_iso(sp) && !is_iso_cp(sp)) || !sp->logk.model[0])
        return PX_OK;
    char msg[256];
    int st = px_reaction_parse_balanced(sp->logk.model, m, msg, sizeof msg);
    if (st)
        return werr(ws, st, "%s: isocoulombic model reaction: %s", sp->f.text, msg);
    return PX_OK;
}

static int push(px_thermo_ws *ws, const px_species *sp)
{
    for (int i = 0; i < ws->depth; i++)
        if (ws->stack[i] == sp) {
            char chain[200] = "";
            size_t len = 0;
            for (int j = i; j < ws->depth && len < sizeof chain; j++)
                len += (size_t)snprintf(chain + len, sizeof chain - len, "%s -> ",
                                        ws->stack[j]->f.text);
            return werr(ws, PX_EDATA, "reaction-defined species form a cycle: %s%s", chain,
                        sp->f.text);
        }
    if (ws->depth >= MAX_LOGK_DEPTH)
        return werr(ws, PX_ELIMIT, "%s: reaction-defined species nested deeper than %d",
                    sp->f.text, MAX_LOGK_DEPTH);
    ws->stack[ws->depth++] = sp;
    return PX_OK;
}

/* the parsed reaction of a LOGK species, cached per db index when sp is in db */
static int logk_get(px_thermo_ws *ws, const px_db *db, const px_species *sp, logk_cache *tmp,
                    const logk_cache **out)
{
    long k = db ? px__db_index_of(db, sp) : -1;
    if (k >= 0) {
        size_t n = px_db_count(db);
        if (ws->lk_db != db || ws->lk_gen != px__db_generation(db) || ws->lk_n < n) {
            for (size_t i = 0; i < ws->lk_n; i++)
                px_free(NULL, ws->lk[i]);
            px_free(NULL, ws->lk);
            ws->lk = px_calloc(NULL, n, sizeof *ws->lk);
            ws->lk_n = ws->lk ? n : 0;
            if (!ws->lk)
                return werr(ws, PX_ENOMEM, "out of memory");
            ws->lk_db = db;
            ws->lk_gen = px__db_generation(db);
        }
        const logk_cache *c = ws->lk[k];
        int valid = c && !strcmp(c->text, sp->f.text) && !strcmp(c->reaction, sp->logk.reaction) &&
                    !strcmp(c->model_text, sp->logk.model);
        for (int i = 0; valid && i < c->r.n; i++) /* another db may sit at the same address */
            if (c->idx[i] >= 0) {
                const px_species *o = px_db_get(db, (size_t)c->idx[i]);
                valid = o && !strcmp(o->f.text, c->r.sp[i].text);
            }
        if (valid) {
            *out = c;
            return PX_OK;
        }
        px_free(NULL, ws->lk[k]);
        ws->lk[k] = NULL;
    }
    int st = logk_find_self(ws, sp, &tmp->r, &tmp->self);
    if (st)
        return st;
    snprintf(tmp->text, sizeof tmp->text, "%s", sp->f.text);
    snprintf(tmp->reaction, sizeof tmp->reaction, "%s", sp->logk.reaction);
    snprintf(tmp->model_text, sizeof tmp->model_text, "%s", sp->logk.model);
    if ((st = model_parse(ws, sp, &tmp->model)))
        return st;
    for (int i = 0; i < tmp->r.n; i++)
        tmp->idx[i] = (i == tmp->self || tmp->r.sp[i].state == PX_STATE_E || !db)
                          ? -1
                          : px_db_index(db, tmp->r.sp[i].text);
    if (k >= 0) {
        logk_cache *c = px_alloc(NULL, sizeof *c);
        if (!c)
            return werr(ws, PX_ENOMEM, "out of memory");
        *c = *tmp;
        ws->lk[k] = c;
        *out = c;
    } else {
        *out = tmp;
    }
    return PX_OK;
}

static int logk_G(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T, double P,
                  double *G)
{
    logk_cache tmp;
    const logk_cache *lc = NULL;
    int st = logk_get(ws, db, sp, &tmp, &lc);
    if (st)
        return st;
    st = push(ws, sp);
    if (st)
        return st;
    double sum = 0;
    for (int i = 0; i < lc->r.n && !st; i++) {
        if (i == lc->self)
            continue;
        double g;
        if (lc->r.sp[i].state == PX_STATE_E) {
            st = electron_G(ws, db, T, P, &g);
        } else {
            if (lc->idx[i] < 0) {
                st = werr(ws, PX_ENOTFOUND, "%s: species %s of its reaction is not in the database",
                          sp->f.text, lc->r.sp[i].text);
                break;
            }
            st = species_G(ws, db, px_db_get(db, (size_t)lc->idx[i]), T, P, &g);
        }
        sum += lc->r.nu[i] * g;
    }
    if (st) {
        ws->depth--;
        return st;
    }
    double dG, dH, dS, dCp, dV;
    if (is_iso(sp))
        st = iso_reaction(ws, db, sp->f.text, &lc->r, lc->model.n ? &lc->model : NULL,
                          sp->logk.logK25, T, P, 0, &dG, &dH, &dS, &dCp, &dV);
    else if (is_iso_cp(sp))
        st = iso_cp_reaction(ws, db, sp->f.text, &sp->logk, &lc->r, &lc->model, T, P, 0, &dG, &dH,
                             &dS, &dCp, &dV);
    else
        logk_reaction(&sp->logk, T, &dG, &dH, &dS, &dCp);
    ws->depth--;
    if (st)
        return st;
    *G = (dG - sum) / lc->r.nu[lc->self];
    return PX_OK;
}

static int species_G_nocache(px_thermo_ws *ws, const px_db *db, const px_species *sp,
                             double T, double P, double *G)
{
    int st;
    const px_water_state *w;
    if (sp->f.state == PX_STATE_E)
        return electron_G(ws, db, T, P, G);
    switch (sp->model) {
    case PX_MODEL_HKF:
        if ((st = water_pair(ws, T, P, &w)))
            return st;
        st = px__hkf_G_common(&sp->hkf, sp->f.charge, sp->dGf, sp->S, &ws->hc, G);
        if (st)
            return werr(ws, st, "%s: HKF G: %s", sp->f.text, px_strerror(st));
        return PX_OK;
    case PX_MODEL_CP: {
        px_thermo_props p;
        st = px_cp_props(sp, T, P, &p);
        if (st)
            return werr(ws, st, "%s: %s", sp->f.text, px_strerror(st));
        *G = p.G;
        return PX_OK;
    }
    case PX_MODEL_LOGK:
        return logk_G(ws, db, sp, T, P, G);
    case PX_MODEL_WATER:
        if ((st = water_pair(ws, T, P, &w)))
            return st;
        *G = sp->dGf + (w->G - ws->wr.G) - (sp->S - ws->wr.S) * (T - PX_TR);
        return isfinite(*G) ? PX_OK : werr(ws, PX_ENONFINITE, "%s: non-finite G", sp->f.text);
    }
    return werr(ws, PX_EDATA, "%s: unknown model", sp->f.text);
}

static int species_G(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                     double P, double *G)
{
    long i = db ? px__db_index_of(db, sp) : -1;
    if (i >= 0) {
        int st = cache_prepare(ws, db, T, P);
        if (st)
            return werr(ws, st, "out of memory");
        if (ws->Gok[i]) {
            *G = ws->Gc[i];
            return PX_OK;
        }
        st = species_G_nocache(ws, db, sp, T, P, G);
        if (st)
            return st;
        ws->Gc[i] = *G;
        ws->Gok[i] = 1;
        return PX_OK;
    }
    return species_G_nocache(ws, db, sp, T, P, G);
}

int px_thermo_species_G(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                        double P, double *G)
{
    if (!ws || !sp || !G)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL; /* the G cache lives for one call (a db may be freed between calls) */
    if (!(T > 0) || !isfinite(P))
        return werr(ws, PX_EINVAL, "T and P must be finite and positive");
    return species_G(ws, db, sp, T, P, G);
}

int px_thermo_eval_all(px_thermo_ws *ws, const px_db *db, double T, double P, double *G)
{
    if (!ws || !db || !G)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL; /* the G cache lives for one call (a db may be freed between calls) */
    if (!(T > 0) || !isfinite(P))
        return werr(ws, PX_EINVAL, "T and P must be finite and positive");
    size_t n = px_db_count(db);
    for (size_t i = 0; i < n; i++) {
        int st = species_G(ws, db, px_db_get(db, i), T, P, &G[i]);
        if (st)
            return st;
    }
    return PX_OK;
}

/* ---- full properties (not cached) ---- */

static int electron_props(px_thermo_ws *ws, const px_db *db, double T, double P,
                          px_thermo_props *out)
{
    const px_species *h2 = px_db_find(db, "H2(g)");
    if (!h2)
        return werr(ws, PX_ENOTFOUND,
                    "e-: the electron convention e- = H^+ - 1/2 H2(g) needs H2(g) in the database");
    px_thermo_props p;
    int st = species_props(ws, db, h2, T, P, &p);
    if (st)
        return st;
    out->G = 0.5 * p.G; /* as electron_G: X(e-) = X(H2,g)/2 - X(H^+), X(H^+) = 0 */
    out->H = 0.5 * p.H;
    out->S = 0.5 * p.S;
    out->Cp = 0.5 * p.Cp;
    out->V = 0.5 * p.V;
    return PX_OK;
}

static int logk_props(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                      double P, px_thermo_props *out)
{
    px_reaction r;
    int self = -1;
    int st = logk_find_self(ws, sp, &r, &self);
    if (st)
        return st;
    st = push(ws, sp);
    if (st)
        return st;
    px_thermo_props sum = {0, 0, 0, 0, 0};
    for (int i = 0; i < r.n && !st; i++) {
        if (i == self)
            continue;
        px_thermo_props p;
        if (r.sp[i].state == PX_STATE_E) {
            st = electron_props(ws, db, T, P, &p);
        } else {
            const px_species *o = px_db_find(db, r.sp[i].text);
            if (!o) {
                st = werr(ws, PX_ENOTFOUND, "%s: species %s of its reaction is not in the database",
                          sp->f.text, r.sp[i].text);
                break;
            }
            st = species_props(ws, db, o, T, P, &p);
        }
        sum.G += r.nu[i] * p.G;
        sum.H += r.nu[i] * p.H;
        sum.S += r.nu[i] * p.S;
        sum.Cp += r.nu[i] * p.Cp;
        sum.V += r.nu[i] * p.V;
    }
    if (st) {
        ws->depth--;
        return st;
    }
    double dG, dH, dS, dCp, dV = 0.0; /* other log K models: independent of P, dV = 0 */
    px_reaction model;
    if (is_iso(sp)) {
        st = model_parse(ws, sp, &model);
        if (!st)
            st = iso_reaction(ws, db, sp->f.text, &r, model.n ? &model : NULL, sp->logk.logK25, T,
                              P, 1, &dG, &dH, &dS, &dCp, &dV);
    } else if (is_iso_cp(sp)) {
        st = model_parse(ws, sp, &model);
        if (!st)
            st = iso_cp_reaction(ws, db, sp->f.text, &sp->logk, &r, &model, T, P, 1, &dG, &dH, &dS,
                                 &dCp, &dV);
    } else
        logk_reaction(&sp->logk, T, &dG, &dH, &dS, &dCp);
    ws->depth--;
    if (st)
        return st;
    double nu = r.nu[self];
    out->G = (dG - sum.G) / nu;
    out->H = (dH - sum.H) / nu;
    out->S = (dS - sum.S) / nu;
    out->Cp = (dCp - sum.Cp) / nu;
    out->V = (dV - sum.V) / nu;
    return PX_OK;
}

static int species_props(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                         double P, px_thermo_props *out)
{
    int st;
    const px_water_state *w;
    if (sp->f.state == PX_STATE_E)
        return electron_props(ws, db, T, P, out);
    switch (sp->model) {
    case PX_MODEL_HKF: {
        if ((st = water_pair(ws, T, P, &w)))
            return st;
        double d2 = ws->g.g != 0 ? d2rho_dT2(ws, T, P) : 0.0;
        st = px_hkf_props(&sp->hkf, sp->f.charge, sp->dGf, sp->dHf, sp->S, w, &ws->wr, d2, out);
        return st ? werr(ws, st, "%s: HKF: %s", sp->f.text, px_strerror(st)) : PX_OK;
    }
    case PX_MODEL_CP:
        st = px_cp_props(sp, T, P, out);
        return st ? werr(ws, st, "%s: %s", sp->f.text, px_strerror(st)) : PX_OK;
    case PX_MODEL_LOGK:
        return logk_props(ws, db, sp, T, P, out);
    case PX_MODEL_WATER:
        if ((st = water_pair(ws, T, P, &w)))
            return st;
        out->G = sp->dGf + (w->G - ws->wr.G) - (sp->S - ws->wr.S) * (T - PX_TR);
        out->S = w->S + (sp->S - ws->wr.S);
        out->H = sp->dHf + (w->H - ws->wr.H);
        out->Cp = w->Cp;
        out->V = w->V;
        return PX_OK;
    }
    return werr(ws, PX_EDATA, "%s: unknown model", sp->f.text);
}

int px_thermo_species_props(px_thermo_ws *ws, const px_db *db, const px_species *sp, double T,
                            double P, px_thermo_props *out)
{
    if (!ws || !sp || !out)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL; /* the G cache lives for one call (a db may be freed between calls) */
    if (!(T > 0) || !isfinite(P))
        return werr(ws, PX_EINVAL, "T and P must be finite and positive");
    return species_props(ws, db, sp, T, P, out);
}

/* ---- reactions ---- */
static int reaction_species(px_thermo_ws *ws, const px_db *db, const px_formula *f,
                            const px_species **sp, px_species *tmp)
{
    if (f->state == PX_STATE_E) {
        px_species_init(tmp);
        tmp->f = *f;
        *sp = tmp;
        return PX_OK;
    }
    *sp = px_db_find(db, f->text);
    if (!*sp)
        return werr(ws, PX_ENOTFOUND, "species %s is not in the database", f->text);
    return PX_OK;
}

int px_reaction_logK(px_thermo_ws *ws, const px_db *db, const px_reaction *r, double T,
                     double P, double *logK)
{
    if (!ws || !db || !r || !logK)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL; /* the G cache lives for one call (a db may be freed between calls) */
    double dG = 0;
    for (int i = 0; i < r->n; i++) {
        const px_species *sp;
        px_species tmp;
        int st = reaction_species(ws, db, &r->sp[i], &sp, &tmp);
        double g;
        if (!st)
            st = species_G(ws, db, sp, T, P, &g);
        if (st)
            return st;
        dG += r->nu[i] * g;
    }
    *logK = -dG / (PX_R * T * PX_LN10);
    return isfinite(*logK) ? PX_OK : PX_ENONFINITE;
}

int px_reaction_props(px_thermo_ws *ws, const px_db *db, const px_reaction *r, double T,
                           double P, px_reaction_result *out)
{
    if (!ws || !db || !r || !out)
        return PX_EINVAL;
    ws->err[0] = '\0';
    ws->depth = 0;
    ws->cdb = NULL; /* the G cache lives for one call (a db may be freed between calls) */
    px_reaction_result o = {0, 0, 0, 0, 0, 0, 0, NAN};
    for (int i = 0; i < r->n; i++) {
        const px_species *sp;
        px_species tmp;
        int st = reaction_species(ws, db, &r->sp[i], &sp, &tmp);
        px_thermo_props p;
        if (!st)
            st = species_props(ws, db, sp, T, P, &p);
        if (st)
            return st;
        o.dG += r->nu[i] * p.G;
        o.dH += r->nu[i] * p.H;
        o.dS += r->nu[i] * p.S;
        o.dCp += r->nu[i] * p.Cp;
        o.dV += r->nu[i] * p.V;
    }
    o.logK = -o.dG / (PX_R * T * PX_LN10);
    o.n_e = px_reaction_electrons(r);
    if (o.n_e != 0)
        o.E = -o.dG / (o.n_e * PX_F);
    if (!isfinite(o.dG) || !isfinite(o.logK))
        return werr(ws, PX_ENONFINITE, "non-finite reaction Gibbs energy");
    *out = o;
    return PX_OK;
}

int px_thermo_default_pressure(double T, double *P)
{
    /* 1 bar while water boils above 1 bar, the saturation pressure above:
     * P = max(1 bar, psat(T)).  This is the usual "1 bar to 100 C, psat above"
     * of the HKF tables, except between 99.61 C (psat = 1 bar) and 100 C,
     * where 1 bar would be steam (psat(100 C) = 1.014 bar); continuous in T. */
    if (!P || !isfinite(T))
        return PX_EINVAL;
    if (T < PX_WATER_TMIN)
        return PX_ERANGE;
    if (T <= PX_T0C + 99.0) { /* psat(99 C) = 0.978 bar < 1 bar */
        *P = PX_PR;
        return PX_OK;
    }
    double ps;
    int st = px_water_psat(T, &ps);
    if (st)
        return st;
    *P = ps > PX_PR ? ps : PX_PR;
    return PX_OK;
}
