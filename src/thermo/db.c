/* db.c - px_db, the species database: an array of species records that it
 * owns (strings included), keyed by canonical formula text.  Lookups go
 * through a small open-addressing hash table rebuilt when the array
 * changes.  A generation counter changes on every modification so caches
 * held by callers (px_thermo_ws) know when to drop what they computed. */
#include "core/alloc.h"
#include <ctype.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"
#include "thermo/thermo_internal.h"

struct px_db {
    px_species *sp;
    size_t n, cap;
    long *hash; /* slot -> index, -1 empty */
    size_t hcap;
    unsigned long gen;
    px_ref *ref; /* the publications the records cite by key, in order added */
    size_t nref, capref;
};

static unsigned long fnv1a(const char *s)
{
    unsigned long h = 2166136261UL;
    while (*s) {
        h ^= (unsigned char)*s++;
        h *= 16777619UL;
    }
    return h;
}

static char *dupstr(const char *s) { return s ? px_strdup(NULL, s) : NULL; }

static void species_release(px_species *sp)
{
    px_free(NULL, sp->source);
    px_free(NULL, sp->file);
    sp->source = sp->file = NULL;
}

static int rehash(px_db *db)
{
    size_t want = 16;
    while (want < 2 * db->n + 1)
        want *= 2;
    if (want != db->hcap) {
        long *h = px_alloc(NULL, want * sizeof *h);
        if (!h)
            return PX_ENOMEM;
        px_free(NULL, db->hash);
        db->hash = h;
        db->hcap = want;
    }
    for (size_t i = 0; i < db->hcap; i++)
        db->hash[i] = -1;
    for (size_t i = 0; i < db->n; i++) {
        size_t s = fnv1a(db->sp[i].f.text) & (db->hcap - 1);
        while (db->hash[s] >= 0)
            s = (s + 1) & (db->hcap - 1);
        db->hash[s] = (long)i;
    }
    return PX_OK;
}

static long find_canon(const px_db *db, const char *canon)
{
    if (!db->hcap)
        return -1;
    size_t s = fnv1a(canon) & (db->hcap - 1);
    while (db->hash[s] >= 0) {
        if (!strcmp(db->sp[db->hash[s]].f.text, canon))
            return db->hash[s];
        s = (s + 1) & (db->hcap - 1);
    }
    return -1;
}

px_db *px_db_new(void)
{
    px_db *db = px_calloc(NULL, 1, sizeof *db);
    if (db && rehash(db)) {
        px_free(NULL, db);
        return NULL;
    }
    return db;
}

void px_db_free(px_db *db)
{
    if (!db)
        return;
    for (size_t i = 0; i < db->n; i++)
        species_release(&db->sp[i]);
    px_free(NULL, db->sp);
    px_free(NULL, db->hash);
    for (size_t i = 0; i < db->nref; i++) {
        px_free(NULL, db->ref[i].short_text);
        px_free(NULL, db->ref[i].cite);
    }
    px_free(NULL, db->ref);
    px_free(NULL, db);
}

unsigned long px__db_generation(const px_db *db) { return db ? db->gen : 0; }

long px__db_index_of(const px_db *db, const px_species *sp)
{
    if (!db || !sp || db->n == 0)
        return -1;
    if (sp >= db->sp && sp < db->sp + db->n)
        return (long)(sp - db->sp);
    return -1;
}

/* a deep copy of src with its formula replaced by the canonical parse */
static int make_copy(const px_species *src, px_species *dst)
{
    px_formula f;
    if (px_formula_parse(src->f.text, &f))
        return PX_EPARSE;
    *dst = *src;
    dst->f = f;
    const char *method = "";
    dst->tbasis = px_species_tbasis(dst, &method);
    snprintf(dst->tmethod, sizeof dst->tmethod, "%s", method);
    dst->source = dupstr(src->source ? src->source : "");
    dst->file = src->file ? dupstr(src->file) : NULL;
    if (!dst->source || (src->file && !dst->file)) {
        species_release(dst);
        return PX_ENOMEM;
    }
    return PX_OK;
}

int px_db_add(px_db *db, const px_species *sp)
{
    if (!db || !sp)
        return PX_EINVAL;
    px_species c;
    int st = make_copy(sp, &c);
    if (st)
        return st;
    if (find_canon(db, c.f.text) >= 0) {
        species_release(&c);
        return PX_EINVAL;
    }
    {
        px_species *p = px_grow(NULL, db->sp, &db->cap, db->n + 1, sizeof *p, 32);
        if (!p) {
            species_release(&c);
            return PX_ENOMEM;
        }
        db->sp = p;
    }
    db->sp[db->n++] = c;
    db->gen++;
    if (2 * db->n + 1 <= db->hcap) { /* room: insert the one new entry */
        size_t s = fnv1a(c.f.text) & (db->hcap - 1);
        while (db->hash[s] >= 0)
            s = (s + 1) & (db->hcap - 1);
        db->hash[s] = (long)(db->n - 1);
        return PX_OK;
    }
    st = rehash(db); /* the table doubles: amortised O(1) per species */
    if (st) { /* undo */
        db->n--;
        species_release(&db->sp[db->n]);
        return st;
    }
    return PX_OK;
}

int px_db_replace(px_db *db, const px_species *sp)
{
    if (!db || !sp)
        return PX_EINVAL;
    px_species c;
    int st = make_copy(sp, &c);
    if (st)
        return st;
    long i = find_canon(db, c.f.text);
    if (i < 0) {
        species_release(&c);
        return px_db_add(db, sp);
    }
    species_release(&db->sp[i]);
    db->sp[i] = c;
    db->gen++;
    return PX_OK;
}

int px_db_remove(px_db *db, const char *formula)
{
    long i = px_db_index(db, formula);
    if (i < 0)
        return PX_ENOTFOUND;
    species_release(&db->sp[i]);
    memmove(&db->sp[i], &db->sp[i + 1], (db->n - (size_t)i - 1) * sizeof *db->sp);
    db->n--;
    db->gen++;
    return rehash(db);
}

size_t px_db_count(const px_db *db) { return db ? db->n : 0; }

const px_species *px_db_get(const px_db *db, size_t i)
{
    return db && i < db->n ? &db->sp[i] : NULL;
}

long px_db_index(const px_db *db, const char *formula)
{
    if (!db || !formula)
        return -1;
    long i = find_canon(db, formula); /* fast path: already canonical */
    if (i >= 0)
        return i;
    px_formula f;
    if (px_formula_parse(formula, &f))
        return -1;
    return find_canon(db, f.text);
}

const px_species *px_db_find(const px_db *db, const char *formula)
{
    long i = px_db_index(db, formula);
    return i >= 0 ? &db->sp[i] : NULL;
}

px_tbasis px_species_tbasis(const px_species *sp, const char **method)
{
    const char *m = "";
    px_tbasis b = PX_TBASIS_MEASURED;
    switch (sp->model) {
    case PX_MODEL_LOGK:
        if (sp->logk.analytic || isfinite(sp->logk.dH)) {
            b = PX_TBASIS_MEASURED;
            if (sp->logk.cp_estimate == PX_LOGK_CP_EST_CRISS_COBBLE) {
                b = PX_TBASIS_ESTIMATED;
                m = PX_METHOD_CRISS_COBBLE; /* dH measured, dCp estimated */
            } else if (sp->logk.cp_estimate == PX_LOGK_CP_EST_ISOCOULOMBIC) {
                b = PX_TBASIS_ESTIMATED;
                m = PX_METHOD_ISO_CP; /* dH measured, dCp(T) of the model reaction */
            }
        } else if (sp->logk.estimate == PX_LOGK_EST_ISOCOULOMBIC) {
            b = PX_TBASIS_ESTIMATED;
            m = PX_METHOD_ISOCOULOMBIC; /* with or without a model reaction (logk.model) */
        } else {
            b = PX_TBASIS_HELD;
        }
        break;
    case PX_MODEL_HKF:
        if (sp->estimated) {
            b = PX_TBASIS_ESTIMATED;
            m = PX_METHOD_HKF_SH88;
        }
        break;
    case PX_MODEL_CP:
        if (sp->cp.estimate == PX_CP_EST_KOPP) {
            b = PX_TBASIS_ESTIMATED;
            m = PX_METHOD_KOPP;
        } else if (sp->f.state != PX_STATE_E && sp->cp.a == 0 && sp->cp.b == 0 && sp->cp.c == 0 &&
            sp->cp.d == 0 && sp->cp.e == 0)
            b = PX_TBASIS_NO_CP;
        break;
    case PX_MODEL_WATER:
        break;
    }
    if (method)
        *method = m;
    return b;
}

const char *px_tbasis_name(px_tbasis b)
{
    switch (b) {
    case PX_TBASIS_MEASURED: return "measured";
    case PX_TBASIS_ESTIMATED: return "estimated";
    case PX_TBASIS_HELD: return "held";
    case PX_TBASIS_NO_CP: return "no Cp";
    }
    return "?";
}

void px_species_init(px_species *sp)
{
    memset(sp, 0, sizeof *sp);
    sp->dGf = sp->dHf = sp->S = NAN;
    sp->logk.dH = NAN;
    sp->unc.G = sp->unc.H = sp->unc.S = sp->unc.logK = NAN;
    sp->Tmin = 0;
    sp->Tmax = INFINITY;
}

/* Liquid water: NBS 1982 (Wagman et al. 1982) dfG, dfH, S at 298.15 K as in
 * tests/reference/gibbs_25C.csv (from memory of the NBS tables). */
#define H2O_DGF (-237129.0) /* J/mol */
#define H2O_DHF (-285830.0) /* J/mol */
#define H2O_S 69.91         /* J/(mol K) */

int px_db_add_builtins(px_db *db)
{
    if (!db)
        return PX_EINVAL;
    px_species w;
    px_species_init(&w);
    strcpy(w.f.text, "H2O(l)");
    w.model = PX_MODEL_WATER;
    w.dGf = H2O_DGF;
    w.dHf = H2O_DHF;
    w.S = H2O_S;
    w.Tmin = PX_WATER_TMIN;
    w.Tmax = PX_WATER_TMAX;
    strcpy(w.quality, "high");
    w.source = "dfG, dfH, S: from memory of [NBS82]; G(T,P) - G(Tr,Pr) from IAPWS-95 [IAPWS95]";
    int st = px_db_replace(db, &w);
    if (st)
        return st;
    px_species e;
    px_species_init(&e);
    strcpy(e.f.text, "e-");
    e.model = PX_MODEL_CP; /* not used: the electron is evaluated by convention */
    e.dGf = 0;
    e.dHf = 0;
    e.S = NAN;
    e.source = "[CONVENTION]: e- = H^+ - 1/2 H2(g) (potentials vs SHE at every T, P)";
    strcpy(e.quality, "high");
    return px_db_replace(db, &e);
}

/* ---- name resolution: formulas as people write them ---- */

/* Same elements, amounts and charge (the state and mineral name aside). */
static int same_composition(const px_formula *a, const px_formula *b)
{
    if (a->n_elem != b->n_elem || a->charge != b->charge)
        return 0;
    for (int e = 0; e < a->n_elem; e++)
        if (a->elem[e].z != b->elem[e].z || fabs(a->elem[e].n - b->elem[e].n) > 1e-9)
            return 0;
    return 1;
}

/* A solid written without a mineral name, "ZnO(s)" or "ZnO(cr)", stands for
 * any solid of its composition ("(cr)" for any crystalline one). */
static int generic_solid_matches(const px_formula *q, const px_formula *f)
{
    if (q->state != PX_STATE_S || f->state != PX_STATE_S || !same_composition(q, f))
        return 0;
    if (!q->form[0])
        return 1;
    return !strcmp(q->form, "cr") && strcmp(f->form, "am") != 0;
}

static int same_text_any_case(const char *a, const char *b)
{
    for (; *a && *b; a++, b++)
        if (tolower((unsigned char)*a) != tolower((unsigned char)*b))
            return 0;
    return *a == *b;
}

/* Which species a failed name may have meant: pass 0 the solids a generic
 * solid matches, 1 anything of the same composition, 2 the same text in
 * another letter case (q is NULL when the name does not parse). */
static int hint_match(int pass, const px_formula *q, const char *name, const px_formula *f)
{
    if (f->state == PX_STATE_E)
        return 0;
    switch (pass) {
    case 0: return q && generic_solid_matches(q, f);
    case 1: return q && same_composition(q, f);
    default: return same_text_any_case(name, f->text);
    }
}

/* "A", "A or B", "A, B or C" of the species hint_match(pass) selects. */
static int hint_list(const px_db *db, int pass, const px_formula *q, const char *name, char *buf, size_t n)
{
    size_t used = 0;
    int k = 0;
    buf[0] = '\0';
    for (size_t j = 0; j < db->n; j++) {
        if (!hint_match(pass, q, name, &db->sp[j].f))
            continue;
        int more = 0;
        for (size_t j2 = j + 1; j2 < db->n && !more; j2++)
            more = hint_match(pass, q, name, &db->sp[j2].f);
        if (used < n) {
            int w = snprintf(buf + used, n - used, "%s%s", k == 0 ? "" : more ? ", " : " or ",
                             db->sp[j].f.text);
            if (w > 0)
                used += (size_t)w < n - used ? (size_t)w : n - used - 1;
        }
        k++;
    }
    return k;
}

int px_db_resolve(const px_db *db, const char *name, long *index, char *msg, size_t msgsize)
{
    if (index)
        *index = -1;
    if (!db || !name)
        return PX_EINVAL;
    char hint[400];
    px_formula q;
    char why[160];
    if (px_formula_parse_msg(name, &q, why, sizeof why)) {
        if (hint_list(db, 2, NULL, name, hint, sizeof hint) > 0)
            return px_fail(msg, msgsize, PX_EPARSE, "%s: malformed formula (%s): did you mean %s?", name, why,
                           hint);
        return px_fail(msg, msgsize, PX_EPARSE, "%s: malformed formula (%s)", name, why);
    }
    long i = find_canon(db, q.text);
    if (i >= 0) {
        if (index)
            *index = i;
        return PX_OK;
    }
    /* a generic solid: the only solid of that composition */
    size_t n_match = 0;
    long first = -1;
    for (size_t k = 0; k < db->n; k++)
        if (generic_solid_matches(&q, &db->sp[k].f) && !n_match++)
            first = (long)k;
    if (n_match == 1) {
        if (index)
            *index = first;
        return PX_OK;
    }
    if (n_match > 1) {
        hint_list(db, 0, &q, name, hint, sizeof hint);
        return px_fail(msg, msgsize, PX_ENOTFOUND, "%s: %zu solids have this formula: did you mean %s?", name,
                       n_match, hint);
    }
    for (int pass = 1; pass <= 2; pass++)
        if (hint_list(db, pass, &q, name, hint, sizeof hint) > 0)
            return px_fail(msg, msgsize, PX_ENOTFOUND, "%s: not in the loaded data: did you mean %s?", name,
                           hint);
    return px_fail(msg, msgsize, PX_ENOTFOUND, "%s: not in the loaded data (is its element loaded?)", name);
}
int px_db_listed(const px_db *db, const char *const *list, size_t n, long index)
{
    for (size_t i = 0; i < n; i++) {
        long j;
        if (list && list[i] && px_db_resolve(db, list[i], &j, NULL, 0) == PX_OK && j == index)
            return 1;
    }
    return 0;
}

int px_db_check_list(const px_db *db, const char *what, const char *const *list, size_t n, char *msg,
                     size_t msgsize)
{
    for (size_t i = 0; i < n; i++) {
        if (!list || !list[i])
            continue;
        char why[512];
        int st = px_db_resolve(db, list[i], NULL, why, sizeof why);
        if (st != PX_OK)
            return px_fail(msg, msgsize, st, "%s: %s", what, why);
    }
    return PX_OK;
}

/* ------------------------------------------------------------- references */

int px_ref_next(const char *text, size_t *pos, char key[PX_REF_KEY_MAX])
{
    if (!text || !pos) return 0;
    for (size_t i = *pos; text[i]; i++) {
        if (text[i] != '[' || !isupper((unsigned char)text[i + 1])) continue;
        size_t k = i + 1;
        while (isalnum((unsigned char)text[k]) || text[k] == '_') k++;
        if (text[k] != ']' || k - (i + 1) >= PX_REF_KEY_MAX) continue;
        memcpy(key, text + i + 1, k - (i + 1));
        key[k - (i + 1)] = '\0';
        *pos = k + 1;
        return 1;
    }
    return 0;
}

const px_ref *px_db_ref_find(const px_db *db, const char *key)
{
    for (size_t i = 0; db && key && i < db->nref; i++)
        if (strcmp(db->ref[i].key, key) == 0) return &db->ref[i];
    return NULL;
}

int px_db_ref_add(px_db *db, const char *key, const char *short_text, const char *cite)
{
    if (!db || !key || !cite || !*key || strlen(key) >= PX_REF_KEY_MAX) return PX_EINVAL;
    const px_ref *old = px_db_ref_find(db, key);
    if (old) return strcmp(old->cite, cite) == 0 ? PX_OK : PX_EINVAL;
    px_ref *grown = px_grow(NULL, db->ref, &db->capref, db->nref + 1, sizeof *grown, 32);
    if (!grown) return PX_ENOMEM;
    db->ref = grown;
    px_ref *r = &db->ref[db->nref];
    snprintf(r->key, sizeof r->key, "%s", key);
    r->short_text = dupstr(short_text && *short_text ? short_text : key);
    r->cite = dupstr(cite);
    if (!r->short_text || !r->cite) {
        px_free(NULL, r->short_text);
        px_free(NULL, r->cite);
        return PX_ENOMEM;
    }
    db->nref++;
    return PX_OK;
}

size_t px_db_ref_count(const px_db *db) { return db ? db->nref : 0; }

const px_ref *px_db_ref_get(const px_db *db, size_t i) { return db && i < db->nref ? &db->ref[i] : NULL; }
