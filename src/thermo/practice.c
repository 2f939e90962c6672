/* practice.c - ligand oxidation states and inhibited solids (see practice.h). */
#include "thermo/practice.h"
#include "core/constants.h"
#include "core/status.h"
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <string.h>

#define Z_H 1
#define Z_O 8
#define OX_EPS 1e-6 /* oxidation states this close are equal (hydrates may be fractional) */
#define CELSIUS(t) ((t) + PX_T0C)

/* Named forms of the ligands (formal oxidation states, IUPAC rules: H +1,
 * O -2).  Practice's kept form comes first for each element. */
static const struct {
    const char *element, *name, *form;
    double ox;
} forms[] = {
    {"N", "ammonia", "ammonia/ammonium", -3.0},
    {"N", "nitrate", "nitrate", 5.0},
    {"C", "carbonate", "carbonate", 4.0},
    {"S", "sulfate", "sulfate", 6.0},
    {"S", "sulfide", "sulfide", -2.0},
};

/* Defaults (docs/solver.md "What practice keeps out"): ammonia is drawn as
 * ammonia in every published metal-ammonia diagram, carbonate as carbonate
 * in every metal-carbonate one, because N2 and graphite/methane form too
 * slowly to matter (common practice).  Sulfur is left in full redox: the
 * published metal-sulfur-water diagrams of corrosion practice draw sulfide
 * and sulfate in equilibrium, which is where the sulfide films and the
 * sour-service caution come from; "sulfate" or "sulfide" pins it. */
px_ligand_states px_ligand_states_default(void)
{
    px_ligand_states ls;
    memset(&ls, 0, sizeof ls);
    ls.rule[ls.n++] = (px_ligand_rule){7, 0, -3.0, "ammonia/ammonium"};
    ls.rule[ls.n++] = (px_ligand_rule){6, 0, 4.0, "carbonate"};
    ls.rule[ls.n++] = (px_ligand_rule){16, 1, 0.0, "sulfide to sulfate"};
    return ls;
}

static px_ligand_rule *rule_of(px_ligand_states *ls, int z)
{
    for (size_t i = 0; i < ls->n; i++)
        if (ls->rule[i].z == z) return &ls->rule[i];
    return NULL;
}

int px_ligand_states_set(px_ligand_states *ls, const char *element, const char *setting, char *msg,
                         size_t msglen)
{
    if (!ls || !element || !setting) return PX_EINVAL;
    int z = px_element_z(element);
    px_ligand_rule *r = z ? rule_of(ls, z) : NULL;
    if (!r) return px_fail(msg, msglen, PX_EINVAL, "ligand_redox: no oxidation-state rule for '%s' (N, C or S)", element);
    if (strcmp(setting, "full") == 0) {
        r->full = 1;
        return PX_OK;
    }
    int first = 1;
    for (size_t k = 0; k < sizeof forms / sizeof forms[0]; k++) {
        if (strcmp(forms[k].element, element) != 0) continue;
        if (strcmp(setting, forms[k].name) == 0 || (first && strcmp(setting, "kept") == 0)) {
            r->full = 0;
            r->ox = forms[k].ox;
            r->form = forms[k].form;
            return PX_OK;
        }
        first = 0;
    }
    return px_fail(msg, msglen, PX_EINVAL, "ligand_redox.%s: '%s' is not \"full\", \"kept\" or a form of %s", element,
                   setting, element);
}

/* Oxidation states element z takes in its species made of z, H and O. */
static size_t states_of(const px_db *db, int z, double *st, size_t max)
{
    size_t n = 0;
    for (size_t i = 0; i < px_db_count(db); i++) {
        const px_formula *f = &px_db_get(db, i)->f;
        double nz = px_formula_count(f, z);
        if (!(nz > 0) || f->state == PX_STATE_E) continue;
        int ok = 1;
        for (int e = 0; e < f->n_elem; e++) ok &= f->elem[e].z == z || f->elem[e].z == Z_H || f->elem[e].z == Z_O;
        if (!ok) continue;
        double ox = (f->charge - px_formula_count(f, Z_H) + 2.0 * px_formula_count(f, Z_O)) / nz;
        int seen = 0;
        for (size_t k = 0; k < n; k++) seen |= fabs(st[k] - ox) < OX_EPS;
        if (!seen && n < max) st[n++] = ox;
    }
    return n;
}

/* The rule pinning element z (not the map's own element skip_z), or NULL. */
static const px_ligand_rule *pinned_rule(const px_ligand_states *ls, int z, int skip_z)
{
    if (z == skip_z) return NULL;
    for (size_t i = 0; i < ls->n; i++)
        if (ls->rule[i].z == z && !ls->rule[i].full) return &ls->rule[i];
    return NULL;
}

#define STATES_MAX 32
int px_ligand_allows(const px_ligand_states *ls, const px_db *db, const px_formula *f, int skip_z)
{
    if (!ls || !f || f->state == PX_STATE_E) return 1;
    /* charge left for the elements that are neither H, O nor pinned */
    double rest = f->charge - px_formula_count(f, Z_H) + 2.0 * px_formula_count(f, Z_O);
    int pinned = 0, others = 0, other_z = 0;
    for (int e = 0; e < f->n_elem; e++) {
        int z = f->elem[e].z;
        if (z == Z_H || z == Z_O) continue;
        const px_ligand_rule *r = pinned_rule(ls, z, skip_z);
        if (r) {
            rest -= f->elem[e].n * r->ox;
            pinned = 1;
        } else {
            others++;
            other_z = z;
        }
    }
    if (!pinned) return 1;
    if (others == 0) return fabs(rest) < OX_EPS;
    if (!db) return 1;
    double st[STATES_MAX];
    if (others == 1) {
        double nz = px_formula_count(f, other_z);
        size_t n = states_of(db, other_z, st, STATES_MAX);
        if (n == 0) return 1; /* nothing to compare with */
        for (size_t k = 0; k < n; k++)
            if (fabs(st[k] - rest / nz) < OX_EPS) return 1;
        return 0;
    }
    double lo = 0, hi = 0;
    for (int e = 0; e < f->n_elem; e++) {
        int z = f->elem[e].z;
        if (z == Z_H || z == Z_O || pinned_rule(ls, z, skip_z)) continue;
        size_t n = states_of(db, z, st, STATES_MAX);
        if (n == 0) return 1;
        double mn = st[0], mx = st[0];
        for (size_t k = 1; k < n; k++) {
            mn = fmin(mn, st[k]);
            mx = fmax(mx, st[k]);
        }
        lo += f->elem[e].n * mn;
        hi += f->elem[e].n * mx;
    }
    return rest >= lo - OX_EPS && rest <= hi + OX_EPS;
}

void px_ligand_states_describe(const px_ligand_states *ls, const int *z, size_t nz, int skip_z, char *buf,
                               size_t n)
{
    if (!buf || !n) return;
    buf[0] = '\0';
    if (!ls) return;
    size_t used = 0;
    for (size_t i = 0; i < ls->n; i++) {
        const px_ligand_rule *r = &ls->rule[i];
        int present = 0;
        for (size_t k = 0; k < nz; k++) present |= z[k] == r->z && z[k] != skip_z;
        if (!present) continue;
        int w;
        if (r->full)
            w = snprintf(buf + used, n - used, "%s%s full redox", used ? "; " : "", px_element_symbol(r->z));
        else
            w = snprintf(buf + used, n - used, "%s%s as %s only (%+g)", used ? "; " : "", px_element_symbol(r->z),
                         r->form, r->ox);
        if (w < 0 || (size_t)w >= n - used) return;
        used += (size_t)w;
    }
}

/* Solids practice keeps from precipitating below T_max.  The temperatures
 * are where laboratory precipitation has been reported, rounded; they are
 * a convention, not a sharp limit. */
static const px_inhibited_solid inhibited[] = {
    {"dolomite", CELSIUS(100.0),
     "Land 1998, Aquatic Geochemistry 4, 361 (no dolomite at 25 C after 32 years at 1000-fold "
     "supersaturation); Arvidson and Mackenzie 1999, Am. J. Sci. 299, 257 (precipitation rates measured "
     "above about 100 C); from memory"},
    {"magnesite", CELSIUS(100.0),
     "Saldi, Schott, Pokrovsky and Oelkers 2009, Geochim. Cosmochim. Acta 73, 5646 (magnesite growth "
     "measured at 100-200 C; hydrated Mg carbonates form instead at lower temperature); from memory"},
    {"quartz", CELSIUS(180.0),
     "Fournier 1977, Geothermics 5, 41 (below about 180 C dissolved silica follows chalcedony or amorphous "
     "silica, not quartz); Rimstidt and Barnes 1980, Geochim. Cosmochim. Acta 44, 1683; from memory"},
};

const px_inhibited_solid *px_inhibited_solids(size_t *n)
{
    if (n) *n = sizeof inhibited / sizeof inhibited[0];
    return inhibited;
}

const px_inhibited_solid *px_inhibited_at(const px_formula *f, double T)
{
    if (!f || f->state != PX_STATE_S) return NULL;
    for (size_t k = 0; k < sizeof inhibited / sizeof inhibited[0]; k++)
        if (strcmp(f->form, inhibited[k].mineral) == 0 && T < inhibited[k].T_max) return &inhibited[k];
    return NULL;
}
