/* equil_system.c - building a speciation system: species rows (formation
 * coefficients over the basis, log K, charge, phase, ion size), one
 * constraint per component, the activity model and SIT coefficients.
 * The system is the problem statement only; solutions live in a workspace
 * (equil_solve.c), so one system can serve several workspaces. */
#include "equil_internal.h"
#include "core/constants.h"
#include <math.h>
#include <stdint.h>
#include <string.h>

static const px_allocator *sys_alloc(const px_equil_system *s)
{
    return s->has_alloc ? &s->alloc : NULL;
}

px_equil_activity px_equil_activity_default(void)
{
    px_equil_activity a;
    memset(&a, 0, sizeof a);
    a.model = PX_EQUIL_IDEAL;
    a.neutral = PX_EQUIL_NEUTRAL_UNITY;
    a.water = PX_EQUIL_WATER_UNITY;
    return a;
}

void px_equil_system_free(px_equil_system *s)
{
    if (!s) return;
    const px_allocator *a = sys_alloc(s);
    px_free(a, s->nu);
    px_free(a, s->logk);
    px_free(a, s->z);
    px_free(a, s->size);
    px_free(a, s->phase);
    px_free(a, s->flags);
    px_free(a, s->is_set);
    px_free(a, s->ckind);
    px_free(a, s->cval);
    px_free(a, s->cgas);
    px_free(a, s->sit_j);
    px_free(a, s->sit_k);
    px_free(a, s->sit_eps);
    px_free(a, s);
}

int px_equil_system_create(px_equil_system **out, size_t nb, size_t ns,
                           const px_allocator *alloc)
{
    if (!out) return PX_EINVAL;
    *out = NULL;
    if (nb == 0 || ns < nb || ns > SIZE_MAX / (nb * sizeof(double))) return PX_EINVAL;
    px_equil_system *s = px_calloc(alloc, 1, sizeof *s);
    if (!s) return PX_ENOMEM;
    if (alloc) {
        s->alloc = *alloc;
        s->has_alloc = 1;
    }
    s->nb = nb;
    s->ns = ns;
    s->nu = px_calloc(alloc, ns * nb, sizeof(double));
    s->logk = px_calloc(alloc, ns, sizeof(double));
    s->z = px_calloc(alloc, ns, sizeof(double));
    s->size = px_calloc(alloc, ns, sizeof(double));
    s->phase = px_calloc(alloc, ns, sizeof(int));
    s->flags = px_calloc(alloc, ns, sizeof(unsigned));
    s->is_set = px_calloc(alloc, ns, 1);
    s->ckind = px_calloc(alloc, nb, sizeof(int));
    s->cval = px_calloc(alloc, nb, sizeof(double));
    s->cgas = px_calloc(alloc, nb, sizeof(size_t));
    if (!s->nu || !s->logk || !s->z || !s->size || !s->phase || !s->flags ||
        !s->is_set || !s->ckind || !s->cval || !s->cgas) {
        px_equil_system_free(s);
        return PX_ENOMEM;
    }
    for (size_t j = 0; j < nb; j++) s->nu[j * nb + j] = 1.0;
    s->act = px_equil_activity_default();
    *out = s;
    return PX_OK;
}

size_t px_equil_system_n_basis(const px_equil_system *s) { return s ? s->nb : 0; }
size_t px_equil_system_n_species(const px_equil_system *s) { return s ? s->ns : 0; }

int px_equil_system_set_species(px_equil_system *s, size_t j, const px_equil_species *sp)
{
    if (!s || !sp || j >= s->ns) return PX_EINVAL;
    if (!isfinite(sp->log_k) || !isfinite(sp->charge) || !isfinite(sp->size) ||
        sp->size < 0.0)
        return PX_EINVAL;
    if (sp->phase < PX_EQUIL_AQ || sp->phase > PX_EQUIL_ELECTRON) return PX_EINVAL;
    size_t nb = s->nb;
    if (j < nb) {
        if (sp->log_k != 0.0 || sp->phase == PX_EQUIL_SOLID) return PX_EINVAL;
        if (sp->nu)
            for (size_t i = 0; i < nb; i++)
                if (sp->nu[i] != (i == j ? 1.0 : 0.0)) return PX_EINVAL;
        if (sp->phase == PX_EQUIL_WATER) {
            for (size_t i = 0; i < nb; i++)
                if (i != j && s->is_set[i] && s->phase[i] == PX_EQUIL_WATER) return PX_EINVAL;
            s->ckind[j] = PX_EQUIL_C_WATER;
        } else if (s->ckind[j] == PX_EQUIL_C_WATER) {
            s->ckind[j] = PX_EQUIL_C_NONE;
        }
    } else {
        if (!sp->nu) return PX_EINVAL;
        if (sp->phase == PX_EQUIL_WATER || sp->phase == PX_EQUIL_ELECTRON) return PX_EINVAL;
        for (size_t i = 0; i < nb; i++) {
            if (!isfinite(sp->nu[i])) return PX_EINVAL;
            s->nu[j * nb + i] = sp->nu[i];
        }
    }
    s->logk[j] = sp->log_k;
    s->z[j] = sp->charge;
    s->size[j] = sp->size;
    s->phase[j] = (int)sp->phase;
    s->flags[j] = sp->flags;
    s->is_set[j] = 1;
    s->rev++;
    return PX_OK;
}

int px_equil_system_set_log_k(px_equil_system *s, size_t j, double log_k)
{
    if (!s || j >= s->ns || !isfinite(log_k)) return PX_EINVAL;
    if (j < s->nb && log_k != 0.0) return PX_EINVAL;
    s->logk[j] = log_k;
    return PX_OK;
}

int px_equil_system_set_flags(px_equil_system *s, size_t j, unsigned flags)
{
    if (!s || j >= s->ns) return PX_EINVAL;
    if (j < s->nb && (flags & PX_EQUIL_EXCLUDED)) return PX_EINVAL;
    s->flags[j] = flags;
    s->rev++;
    return PX_OK;
}

static int settable(const px_equil_system *s, size_t i)
{
    return s && i < s->nb && s->ckind[i] != PX_EQUIL_C_WATER;
}

/* a change of constraint kind changes the structure the solver prepares */
static void set_kind(px_equil_system *s, size_t i, int kind)
{
    if (s->ckind[i] != kind) s->rev++;
    s->ckind[i] = kind;
}

int px_equil_system_set_total(px_equil_system *s, size_t i, double total)
{
    if (!settable(s, i) || !isfinite(total)) return PX_EINVAL;
    set_kind(s, i, PX_EQUIL_C_TOTAL);
    s->cval[i] = total;
    return PX_OK;
}

int px_equil_system_set_log_activity(px_equil_system *s, size_t i, double log_a)
{
    if (!settable(s, i) || !isfinite(log_a)) return PX_EINVAL;
    set_kind(s, i, PX_EQUIL_C_ACTIVITY);
    s->cval[i] = log_a;
    return PX_OK;
}

int px_equil_system_set_ph(px_equil_system *s, size_t i, double ph)
{
    return px_equil_system_set_log_activity(s, i, -ph);
}

int px_equil_system_set_pe(px_equil_system *s, size_t i, double pe)
{
    return px_equil_system_set_log_activity(s, i, -pe);
}

int px_equil_system_set_eh(px_equil_system *s, size_t i, double eh, double T)
{
    if (!isfinite(eh) || !isfinite(T) || T <= 0.0) return PX_EINVAL;
    /* pe = F E / (R T ln 10) (DESIGN.md conventions; CODATA 2018 F and R) */
    double pe = PX_F * eh / (PX_R * T * PX_LN10);
    return px_equil_system_set_pe(s, i, pe);
}

int px_equil_system_set_fugacity(px_equil_system *s, size_t i, size_t g, double log_f)
{
    if (!settable(s, i) || g >= s->ns || g < s->nb || !isfinite(log_f)) return PX_EINVAL;
    if (s->is_set[g] && s->phase[g] != PX_EQUIL_GAS) return PX_EINVAL;
    set_kind(s, i, PX_EQUIL_C_FUGACITY);
    if (s->cgas[i] != g) s->rev++;
    s->cval[i] = log_f;
    s->cgas[i] = g;
    return PX_OK;
}

int px_equil_system_set_charge_balance(px_equil_system *s, size_t i)
{
    if (!settable(s, i)) return PX_EINVAL;
    set_kind(s, i, PX_EQUIL_C_CHARGE);
    s->cval[i] = 0.0;
    return PX_OK;
}

int px_equil_system_set_activity(px_equil_system *s, const px_equil_activity *act)
{
    if (!s || !act) return PX_EINVAL;
    if (act->model < PX_EQUIL_IDEAL || act->model > PX_EQUIL_SIT) return PX_EINVAL;
    if (act->neutral != PX_EQUIL_NEUTRAL_UNITY && act->neutral != PX_EQUIL_NEUTRAL_SALTING)
        return PX_EINVAL;
    if (act->water != PX_EQUIL_WATER_UNITY && act->water != PX_EQUIL_WATER_IDEAL)
        return PX_EINVAL;
    if (!isfinite(act->A) || !isfinite(act->B) || !isfinite(act->bdot) ||
        !isfinite(act->b_neutral) || act->A < 0.0 || act->B < 0.0)
        return PX_EINVAL;
    s->act = *act;
    s->rev++;
    return PX_OK;
}

int px_equil_system_set_sit(px_equil_system *s, size_t j, size_t k, double eps)
{
    if (!s || j >= s->ns || k >= s->ns || !isfinite(eps)) return PX_EINVAL;
    if (k < j) {
        size_t t = j;
        j = k;
        k = t;
    }
    for (size_t p = 0; p < s->n_sit; p++)
        if (s->sit_j[p] == j && s->sit_k[p] == k) {
            s->sit_eps[p] = eps;
            return PX_OK;
        }
    if (s->n_sit == s->cap_sit) {
        const px_allocator *a = sys_alloc(s);
        size_t cap = s->cap_sit ? 2 * s->cap_sit : 16;
        size_t *nj = px_calloc(a, cap, sizeof(size_t));
        size_t *nk = px_calloc(a, cap, sizeof(size_t));
        double *ne = px_calloc(a, cap, sizeof(double));
        if (!nj || !nk || !ne) {
            px_free(a, nj);
            px_free(a, nk);
            px_free(a, ne);
            return PX_ENOMEM;
        }
        if (s->n_sit) {
            memcpy(nj, s->sit_j, s->n_sit * sizeof(size_t));
            memcpy(nk, s->sit_k, s->n_sit * sizeof(size_t));
            memcpy(ne, s->sit_eps, s->n_sit * sizeof(double));
        }
        px_free(a, s->sit_j);
        px_free(a, s->sit_k);
        px_free(a, s->sit_eps);
        s->sit_j = nj;
        s->sit_k = nk;
        s->sit_eps = ne;
        s->cap_sit = cap;
    }
    s->sit_j[s->n_sit] = j;
    s->sit_k[s->n_sit] = k;
    s->sit_eps[s->n_sit] = eps;
    s->n_sit++;
    return PX_OK;
}
