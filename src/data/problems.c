/* problems.c - the diagnostics list of the definition-file loader.
 *
 * A problem names the file, the line, the species (as written), the field and
 * what is wrong, and renders as one line a person can click in an editor:
 *     Zn.lua:14: ZnO(s): S: must be positive for a solid
 *     Zn.lua:20: Zn(s): warning: cp: no heat capacity given
 * Errors reject the file; warnings do not. */
#include "core/alloc.h"
#include "data/data_internal.h"
#include "core/status.h"
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

struct px_data_problems {
    px_data_problem *items;
    size_t n, cap;
};

char *pxd_strdup(const char *s) { return px_strdup(NULL, s ? s : ""); }

px_data_problems *px_data_problems_new(void)
{
    return px_calloc(NULL, 1, sizeof(px_data_problems));
}

static void problem_free(px_data_problem *p)
{
    px_free(NULL, p->file);
    px_free(NULL, p->species);
    px_free(NULL, p->field);
    px_free(NULL, p->message);
}

void px_data_problems_clear(px_data_problems *p)
{
    if (!p) return;
    for (size_t i = 0; i < p->n; i++) problem_free(&p->items[i]);
    p->n = 0;
}

void px_data_problems_free(px_data_problems *p)
{
    if (!p) return;
    px_data_problems_clear(p);
    px_free(NULL, p->items);
    px_free(NULL, p);
}

size_t px_data_problems_count(const px_data_problems *p) { return p ? p->n : 0; }

static size_t count_sev(const px_data_problems *p, px_data_severity s)
{
    size_t k = 0;
    for (size_t i = 0; p && i < p->n; i++) k += p->items[i].severity == s;
    return k;
}

size_t px_data_problems_errors(const px_data_problems *p) { return count_sev(p, PX_DATA_ERROR); }
size_t px_data_problems_warnings(const px_data_problems *p) { return count_sev(p, PX_DATA_WARNING); }

const px_data_problem *px_data_problems_get(const px_data_problems *p, size_t i)
{
    return (p && i < p->n) ? &p->items[i] : NULL;
}

int px_data_problem_format(const px_data_problem *pr, char *buf, size_t size)
{
    char line[32] = "";
    if (pr->line > 0) snprintf(line, sizeof line, ":%d", pr->line);
    const char *sp = pr->species && *pr->species ? pr->species : NULL;
    const char *fd = pr->field && *pr->field ? pr->field : NULL;
    return snprintf(buf, size, "%s%s: %s%s%s%s%s%s", pr->file, line, sp ? sp : "", sp ? ": " : "",
                    pr->severity == PX_DATA_WARNING ? "warning: " : "", fd ? fd : "",
                    fd ? ": " : "", pr->message);
}

size_t px_data_problems_write(const px_data_problems *p, FILE *out)
{
    size_t errors = 0;
    for (size_t i = 0; p && i < p->n; i++) {
        const px_data_problem *pr = &p->items[i];
        int n = px_data_problem_format(pr, NULL, 0);
        char *buf = n >= 0 ? px_alloc(NULL, (size_t)n + 1) : NULL;
        if (buf) {
            px_data_problem_format(pr, buf, (size_t)n + 1);
            fprintf(out, "%s\n", buf);
            px_free(NULL, buf);
        } else {
            fprintf(out, "%s: %s\n", pr->file, pr->message);
        }
        errors += pr->severity == PX_DATA_ERROR;
    }
    return errors;
}

/* A copy of S with control characters written as \xNN (an element file
 * from a stranger must not drive the user's terminal); NULL if out of memory. */
static char *escaped_dup(const char *s)
{
    if (!s) s = "";
    size_t n = 0;
    for (const unsigned char *p = (const unsigned char *)s; *p; p++) n += (*p < 0x20 || *p == 0x7f) ? 4 : 1;
    char *out = px_alloc(NULL, n + 1), *q = out;
    if (!out) return NULL;
    for (const unsigned char *p = (const unsigned char *)s; *p; p++) {
        if (*p < 0x20 || *p == 0x7f) q += snprintf(q, 5, "\\x%02x", *p);
        else *q++ = (char)*p;
    }
    *q = '\0';
    return out;
}

static void vreport(pxd_file *f, px_data_severity sev, int line, const char *species,
                    const char *field, const char *fmt, va_list ap)
{
    if (sev == PX_DATA_ERROR) {
        f->n_errors++;
        if (f->status == PX_OK) f->status = PX_EDATA;
    }
    px_data_problems *p = f->probs;
    {
        px_data_problem *it = px_grow(NULL, p->items, &p->cap, p->n + 1, sizeof *it, 16);
        if (!it) {
            f->oom = 1;
            return;
        }
        p->items = it;
    }
    va_list ap2;
    va_copy(ap2, ap);
    int n = vsnprintf(NULL, 0, fmt, ap2);
    va_end(ap2);
    char *raw = n >= 0 ? px_alloc(NULL, (size_t)n + 1) : NULL;
    if (raw) vsnprintf(raw, (size_t)n + 1, fmt, ap);
    char *msg = raw ? escaped_dup(raw) : NULL;
    px_free(NULL, raw);
    px_data_problem pr = {sev, escaped_dup(f->name), line, escaped_dup(species), escaped_dup(field),
                          msg};
    if (!pr.file || !pr.species || !pr.field || !pr.message) {
        problem_free(&pr);
        f->oom = 1;
        return;
    }
    p->items[p->n++] = pr;
}

void pxd_report(pxd_file *f, px_data_severity sev, int line, const char *species,
                const char *field, const char *fmt, ...)
{
    va_list ap;
    va_start(ap, fmt);
    vreport(f, sev, line, species, field, fmt, ap);
    va_end(ap);
}

void pxd_report_entry(pxd_file *f, pxd_entry *e, px_data_severity sev, const char *field,
                      const char *fmt, ...)
{
    if (sev == PX_DATA_ERROR) e->errors++;
    int line = field && *field ? pxd_field_line(f, e, field) : 0;
    if (line <= 0) line = pxd_species_line(f, e);
    va_list ap;
    va_start(ap, fmt);
    vreport(f, sev, line, e->raw, field, fmt, ap);
    va_end(ap);
}

void pxd_entry_free(pxd_entry *e)
{
    px_free(NULL, e->sp.source);
    px_free(NULL, e->sp.file);
    e->sp.source = e->sp.file = NULL;
}
