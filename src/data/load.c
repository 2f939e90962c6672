/* load.c - the public entry points: check, load, merge user overrides, list.
 *
 * Every entry point runs the same pipeline (tokenize for line numbers, run in
 * the sandbox, read the table, check the file), so `phlox check` accepts a
 * file exactly when loading it would succeed.  Loading is all or nothing: a
 * file with any error adds nothing, and the database is only touched after
 * every check has passed. */
#define _POSIX_C_SOURCE 200809L
#include "core/alloc.h"
#include "data/data_internal.h"
#include "core/status.h"
#include "embed/embedded.h"
#include <errno.h>
#include <pthread.h>
#include <fcntl.h>
#include <math.h>
#include <stdio.h>
#include <sys/stat.h>
#include <unistd.h>
#include <stdlib.h>
#include <string.h>

px_data_options px_data_options_default(void)
{
    px_data_options o;
    memset(&o, 0, sizeof o);
    o.mem_limit = PX_DATA_MEM_LIMIT_DEFAULT;
    o.instr_limit = PX_DATA_INSTR_LIMIT_DEFAULT;
    o.wall_limit = PX_DATA_WALL_LIMIT_DEFAULT;
    o.consistency_tol = PX_DATA_CONSISTENCY_TOL_DEFAULT;
    o.magnitude_warn = PX_DATA_MAGNITUDE_WARN_DEFAULT;
    return o;
}

static void file_free(pxd_file *f, px_data_problems *own)
{
    for (size_t i = 0; i < f->n; i++) pxd_entry_free(&f->e[i]);
    px_free(NULL, f->e);
    px_free(NULL, f->ex);
    for (size_t i = 0; i < f->n_refs; i++) {
        px_free(NULL, f->refs[i].cite);
        px_free(NULL, f->refs[i].short_text);
    }
    px_free(NULL, f->refs);
    px_free(NULL, f->tok);
    pxd_index_free(f);
    px_data_problems_free(own);
}

/* Runs the pipeline; returns PX_OK or the failure code.  f must be freed. */
static int run(pxd_file *f, px_data_problems **own, const char *text, size_t len,
               const char *name, const px_data_options *opt, px_data_problems *probs,
               const px_db *known)
{
    memset(f, 0, sizeof *f);
    *own = NULL;
    if (!probs) probs = *own = px_data_problems_new();
    if (!probs) return PX_ENOMEM;
    f->name = name ? name : "(buffer)";
    f->text = text;
    f->len = len;
    f->opt = opt;
    f->probs = probs;
    f->known = known;
    f->e_unit = 1000.0; /* kJ by default (docs/element-files.md, Units) */
    f->s_unit = 1.0;    /* J/(mol K) */
    f->Tmin = PXD_TMIN_DEFAULT;
    f->Tmax = PXD_TMAX_DEFAULT;
    if (!text || opt->mem_limit == 0 || opt->instr_limit == 0 || !(opt->wall_limit > 0) ||
        !(opt->consistency_tol > 0) || !(opt->magnitude_warn > 0))
        return PX_EINVAL;
    if (pxd_tokenize(f) != PX_OK) return PX_ENOMEM;
    pxd_sandbox_run(f);
    if (f->oom) return PX_ENOMEM;
    if (f->status == PX_EPARSE || f->status == PX_ELIMIT) return f->status;
    pxd_check_file(f, known);
    if (f->oom) return PX_ENOMEM;
    if (f->n_errors) return f->status ? f->status : PX_EDATA;
    return PX_OK;
}

int px_data_check_buffer(const px_db *known, const char *text, size_t len, const char *name,
                         const px_data_options *opt, px_data_problems *probs)
{
    px_data_options d = px_data_options_default();
    pxd_file f;
    px_data_problems *own;
    int st = run(&f, &own, text, len, name, opt ? opt : &d, probs, known);
    file_free(&f, own);
    return st;
}

/* adds (or, for user files, replaces) the entries; undoes additions on failure */
/* ---- the standard bibliography ------------------------------------------ */

#define PXD_BIBLIOGRAPHY "stdlib/bibliography.lua"

static pxd_file stdlib_bib;
static int stdlib_bib_ok;
static pthread_once_t stdlib_bib_once = PTHREAD_ONCE_INIT;

/* Read once per process and kept: the records of every database borrow
 * nothing from it (px_db_ref_add copies). */
static void stdlib_bib_load(void)
{
    const px_embedded_file *ef = px_embedded_find(PXD_BIBLIOGRAPHY);
    static px_data_options opt;
    px_data_problems *own;
    opt = px_data_options_default();
    if (!ef) return;
    int st = run(&stdlib_bib, &own, ef->data, ef->size, ef->path, &opt, NULL, NULL);
    stdlib_bib_ok = st == PX_OK && stdlib_bib.bibliography;
    stdlib_bib.probs = NULL; /* the private list goes; the references stay */
    stdlib_bib.known = NULL;
    px_data_problems_free(own);
}

const pxd_file *pxd_stdlib_bibliography(void)
{
    pthread_once(&stdlib_bib_once, stdlib_bib_load);
    return stdlib_bib_ok ? &stdlib_bib : NULL;
}

static pxd_ref *refs_find(const pxd_file *f, const char *key)
{
    pxd_ref probe;
    snprintf(probe.key, sizeof probe.key, "%s", key);
    return f && f->n_refs ? bsearch(&probe, f->refs, f->n_refs, sizeof *f->refs, pxd_ref_cmp) : NULL;
}

int pxd_ref_lookup(pxd_file *f, const char *key, const char **short_text, const char **cite)
{
    pxd_ref *r = refs_find(f, key);
    if (r) {
        r->cited = 1;
    } else if (f->known && px_db_ref_find(f->known, key)) {
        const px_ref *k = px_db_ref_find(f->known, key);
        *short_text = k->short_text;
        *cite = k->cite;
        return 1;
    } else if (!(r = refs_find(pxd_stdlib_bibliography(), key))) {
        return 0;
    }
    *short_text = r->short_text;
    *cite = r->cite;
    return 1;
}

int px_data_cite_builtins(px_db *db)
{
    const pxd_file *bib = pxd_stdlib_bibliography();
    if (!db) return PX_EINVAL;
    if (!bib) return PX_ENOTFOUND;
    for (size_t i = 0; i < px_db_count(db); i++) {
        char key[PX_REF_KEY_MAX];
        size_t pos = 0;
        while (px_ref_next(px_db_get(db, i)->source, &pos, key)) {
            if (px_db_ref_find(db, key)) continue;
            const pxd_ref *r = refs_find(bib, key);
            if (!r) return PX_ENOTFOUND;
            int st = px_db_ref_add(db, key, r->short_text, r->cite);
            if (st != PX_OK) return st;
        }
    }
    return PX_OK;
}

/* The references the file's loaded species cite, into the database. */
static int commit_refs(px_db *db, pxd_file *f)
{
    for (size_t i = 0; i < f->n; i++) {
        if (f->e[i].skip) continue;
        char key[PX_REF_KEY_MAX];
        size_t pos = 0;
        while (px_ref_next(f->e[i].sp.source, &pos, key)) {
            const char *st = NULL, *ci = NULL;
            if (!pxd_ref_lookup(f, key, &st, &ci)) continue; /* the check reported it */
            int rc = px_db_ref_add(db, key, st, ci);
            if (rc == PX_ENOMEM) return rc;
        }
    }
    return PX_OK;
}

static int commit(px_db *db, pxd_file *f)
{
    int rst = commit_refs(db, f);
    if (rst != PX_OK) return rst;
    if (f->opt->user_file) {
        for (size_t i = 0; i < f->n_ex; i++) {
            long k;
            if (px_db_resolve(db, f->ex[i].raw, &k, NULL, 0) == PX_OK) {
                char text[PX_NAME_MAX];
                snprintf(text, sizeof text, "%s", px_db_get(db, (size_t)k)->f.text);
                px_db_remove(db, text);
            }
        }
        for (size_t i = 0; i < f->n; i++) {
            if (f->e[i].skip) continue;
            int st = px_db_replace(db, &f->e[i].sp);
            if (st != PX_OK) return st; /* only PX_ENOMEM; documented as partial */
        }
        return PX_OK;
    }
    for (size_t i = 0; i < f->n; i++) {
        if (f->e[i].skip) continue;
        int st = px_db_add(db, &f->e[i].sp);
        if (st != PX_OK) {
            while (i-- > 0)
                if (!f->e[i].skip) px_db_remove(db, f->e[i].sp.f.text);
            return st;
        }
    }
    return PX_OK;
}

static int load(px_db *db, const char *text, size_t len, const char *name,
                const px_data_options *opt, px_data_problems *probs, int user)
{
    if (!db) return PX_EINVAL;
    px_data_options o = opt ? *opt : px_data_options_default();
    if (user) o.user_file = 1;
    pxd_file f;
    px_data_problems *own;
    int st = run(&f, &own, text, len, name, &o, probs, db);
    if (st == PX_OK) st = commit(db, &f);
    file_free(&f, own);
    return st;
}

int px_data_load_buffer(px_db *db, const char *text, size_t len, const char *name,
                        const px_data_options *opt, px_data_problems *probs)
{
    return load(db, text, len, name, opt, probs, 0);
}

int px_data_merge_user_buffer(px_db *db, const char *text, size_t len, const char *name,
                              const px_data_options *opt, px_data_problems *probs)
{
    return load(db, text, len, name, opt, probs, 1);
}

/* Reads PATH into a NUL-terminated buffer: regular files only (a FIFO, a
 * device or a symlink to /dev/zero is refused before reading), at most
 * PX_DATA_FILE_MAX bytes.  Every load path (C, `phlox check`, the Lua
 * library reader) goes through here. */
int px_data_read_file(const char *path, char **out, size_t *len, char *msg, size_t msgsize)
{
    *out = NULL;
    *len = 0;
    if (msgsize) msg[0] = '\0';
    if (!path) return PX_EINVAL;
    int fd = open(path, O_RDONLY | O_NONBLOCK | O_NOCTTY);
    if (fd < 0) {
        snprintf(msg, msgsize, "cannot open the file (%s)", strerror(errno));
        return PX_EIO;
    }
    struct stat st;
    if (fstat(fd, &st) != 0 || !S_ISREG(st.st_mode)) {
        snprintf(msg, msgsize, "not a regular file (a folder, device or pipe is refused)");
        close(fd);
        return PX_EIO;
    }
    if ((unsigned long long)st.st_size > PX_DATA_FILE_MAX) {
        snprintf(msg, msgsize, "file larger than %zu bytes", (size_t)PX_DATA_FILE_MAX);
        close(fd);
        return PX_ELIMIT;
    }
    size_t cap = (size_t)st.st_size + 1, n = 0;
    char *buf = px_alloc(NULL, cap + 1);
    if (!buf) {
        close(fd);
        return PX_ENOMEM;
    }
    for (;;) { /* read one byte past the stat size to see a growing file */
        ssize_t r = read(fd, buf + n, cap - n);
        if (r < 0 && errno == EINTR) continue;
        if (r < 0) {
            snprintf(msg, msgsize, "read error (%s)", strerror(errno));
            px_free(NULL, buf);
            close(fd);
            return PX_EIO;
        }
        if (r == 0) break;
        n += (size_t)r;
        if (n == cap) {
            snprintf(msg, msgsize, "file changed size while read");
            px_free(NULL, buf);
            close(fd);
            return PX_EIO;
        }
    }
    close(fd);
    buf[n] = '\0';
    *out = buf;
    *len = n;
    return PX_OK;
}

static int read_file(const char *path, char **out, size_t *len, px_data_problems *probs)
{
    char msg[256];
    int st = px_data_read_file(path, out, len, msg, sizeof msg);
    if (st != PX_OK && probs && path) {
        pxd_file f; /* only for pxd_report */
        memset(&f, 0, sizeof f);
        f.name = path;
        f.probs = probs;
        pxd_report(&f, PX_DATA_ERROR, 0, "", "", "%s", msg[0] ? msg : px_strerror(st));
    }
    return st;
}

int px_data_load_file(px_db *db, const char *path, const px_data_options *opt,
                      px_data_problems *probs)
{
    char *text;
    size_t len;
    int st = read_file(path, &text, &len, probs);
    if (st != PX_OK) return st;
    st = px_data_load_buffer(db, text, len, path, opt, probs);
    px_free(NULL, text);
    return st;
}

int px_data_merge_user_file(px_db *db, const char *path, const px_data_options *opt,
                            px_data_problems *probs)
{
    char *text;
    size_t len;
    int st = read_file(path, &text, &len, probs);
    if (st != PX_OK) return st;
    st = px_data_merge_user_buffer(db, text, len, path, opt, probs);
    px_free(NULL, text);
    return st;
}

int px_data_check_file(const px_db *known, const char *path, const px_data_options *opt,
                       px_data_problems *probs)
{
    char *text;
    size_t len;
    int st = read_file(path, &text, &len, probs);
    if (st != PX_OK) return st;
    st = px_data_check_buffer(known, text, len, path, opt, probs);
    px_free(NULL, text);
    return st;
}

int px_data_check_files(const char *const *paths, size_t n, const px_data_options *opt,
                        px_data_problems *probs)
{
    px_db *db = px_db_new();
    if (!db) return PX_ENOMEM;
    int first = px_db_add_builtins(db);
    for (size_t i = 0; i < n && first != PX_ENOMEM; i++) {
        int st = px_data_load_file(db, paths[i], opt, probs);
        if (st != PX_OK && first == PX_OK) first = st;
    }
    px_db_free(db);
    return first;
}

int px_data_load_embedded(px_db *db, const char *element, const px_data_options *opt,
                          px_data_problems *probs)
{
    char path[64];
    if (!element || strlen(element) > 8) return PX_EINVAL;
    snprintf(path, sizeof path, "stdlib/elements/%s.lua", element);
    const px_embedded_file *ef = px_embedded_find(path);
    if (!ef) return PX_ENOTFOUND;
    return px_data_load_buffer(db, ef->data, ef->size, ef->path, opt, probs);
}

static const char *model_name(px_model m)
{
    switch (m) {
    case PX_MODEL_HKF: return "hkf";
    case PX_MODEL_CP: return "cp";
    case PX_MODEL_LOGK: return "logk";
    case PX_MODEL_WATER: return "water";
    }
    return "?";
}

static int has_element(const px_species *sp, int z)
{
    int has = !z;
    for (int j = 0; j < sp->f.n_elem && !has; j++) has = sp->f.elem[j].z == z;
    return has;
}

/* The references the listed species cite, each once, in the order the
 * database holds them. */
static void list_refs(const px_db *db, int z, FILE *out)
{
    int head = 0;
    for (size_t r = 0; r < px_db_ref_count(db); r++) {
        const px_ref *ref = px_db_ref_get(db, r);
        int cited = 0;
        for (size_t i = 0; i < px_db_count(db) && !cited; i++) {
            const px_species *sp = px_db_get(db, i);
            char key[PX_REF_KEY_MAX];
            size_t pos = 0;
            if (!has_element(sp, z)) continue;
            while (!cited && px_ref_next(sp->source, &pos, key)) cited = strcmp(key, ref->key) == 0;
        }
        if (!cited) continue;
        if (!head++) fprintf(out, "\nreferences:\n");
        fprintf(out, "[%s] %s\n", ref->key, ref->cite);
    }
}

size_t px_data_list_write(const px_db *db, const char *element, FILE *out)
{
    int z = 0;
    if (element && *element && (z = px_element_z(element)) == 0) return 0;
    size_t k = 0;
    for (size_t i = 0; i < px_db_count(db); i++) {
        const px_species *sp = px_db_get(db, i);
        if (!has_element(sp, z)) continue;
        char val[64];
        if (sp->model == PX_MODEL_LOGK && isfinite(sp->unc.logK))
            snprintf(val, sizeof val, "log K %.3f +- %.2g", sp->logk.logK25, sp->unc.logK);
        else if (sp->model == PX_MODEL_LOGK)
            snprintf(val, sizeof val, "log K %.3f", sp->logk.logK25);
        else if (isfinite(sp->dGf) && isfinite(sp->unc.G))
            snprintf(val, sizeof val, "G %.3f +- %.2g kJ/mol", sp->dGf / 1000.0, sp->unc.G / 1000.0);
        else if (isfinite(sp->dGf))
            snprintf(val, sizeof val, "G %.3f kJ/mol", sp->dGf / 1000.0);
        else
            snprintf(val, sizeof val, "-");
        /* the other published uncertainties, where the source gives them */
        char unc[96] = "";
        size_t used = 0;
        const double u[] = {sp->unc.H / 1000.0, sp->unc.S, sp->model == PX_MODEL_LOGK ? NAN : sp->unc.logK,
                            sp->model == PX_MODEL_LOGK ? sp->unc.G / 1000.0 : NAN};
        const char *const un[] = {"H +- %.2g kJ/mol", "S +- %.2g J/(mol K)", "log K +- %.2g", "G +- %.2g kJ/mol"};
        for (int q = 0; q < 4; q++) {
            if (!isfinite(u[q]) || used >= sizeof unc) continue;
            int w = snprintf(unc + used, sizeof unc - used, used ? ", " : " [");
            if (w > 0) used += (size_t)w;
            if (used < sizeof unc) {
                w = snprintf(unc + used, sizeof unc - used, un[q], u[q]);
                if (w > 0) used += (size_t)w;
            }
        }
        if (used && used + 1 < sizeof unc) strcat(unc, "]");
        char where[300];
        if (sp->file) snprintf(where, sizeof where, "%s:%d", sp->file, sp->line);
        else snprintf(where, sizeof where, "(built in)");
        /* the temperature basis: [held at 25 C], [estimated: method], with
         * an isocoulombic estimate's model reaction (of log K or of dCp), [no Cp] */
        char basis[96 + sizeof sp->logk.model] = "";
        if (sp->tbasis == PX_TBASIS_ESTIMATED && sp->model == PX_MODEL_LOGK && sp->logk.model[0])
            snprintf(basis, sizeof basis, " [estimated: %s; model reaction %s]", sp->tmethod, sp->logk.model);
        else if (sp->tbasis == PX_TBASIS_ESTIMATED)
            snprintf(basis, sizeof basis, " [estimated: %s]", sp->tmethod);
        else if (sp->tbasis == PX_TBASIS_HELD)
            snprintf(basis, sizeof basis, " [held at 25 C]");
        else if (sp->tbasis == PX_TBASIS_NO_CP)
            snprintf(basis, sizeof basis, " [no Cp: taken as 0]");
        fprintf(out, "%-24s %-5s %-22s%s %s  %s%s\n", sp->f.text, model_name(sp->model), val, unc, where,
                sp->source ? sp->source : "", basis);
        k++;
    }
    list_refs(db, z, out);
    return k;
}
