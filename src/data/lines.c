/* lines.c - line numbers for species and fields, without the debug library.
 *
 * The sandbox has no debug library, and a table built by a constructor keeps
 * no trace of where it was written.  So the loader tokenizes the source text
 * itself (names, strings, comments and brackets as Lua 5.4's lexer sees them;
 * numbers and operators are single "other" tokens) and finds:
 *   - a species: the k-th `formula = "<as written>"` (k-th for the k-th
 *     species with that text, so duplicates point at their own lines); the
 *     species table is the innermost `{ ... }` around it, and the species'
 *     line is the line of that `{`;
 *   - a field: the first `name =` at the right depth inside that table
 *     ("hkf.a2": `a2 =` inside the `hkf = { }` table);
 *   - if no `formula =` is found (a species built by a helper function), the
 *     k-th string literal with that text (its enclosing table if it has one,
 *     else the literal's own line); failing that, the k-th table of a literal
 *     `species = { ... }` list; else line 0 (unknown).
 * Comments and strings are skipped properly, so commented-out species do not
 * confuse the count. */
#include "core/alloc.h"
#include "data/data_internal.h"
#include "core/status.h"
#include <ctype.h>
#include <stdlib.h>
#include <string.h>

static int push_tok(pxd_file *f, size_t *cap, pxd_tok t)
{
    if (f->ntok == *cap) {
        size_t c = *cap ? 2 * *cap : 256;
        pxd_tok *n = px_realloc(NULL, f->tok, *cap * sizeof *n, c * sizeof *n);
        if (!n) return PX_ENOMEM;
        f->tok = n;
        *cap = c;
    }
    f->tok[f->ntok++] = t;
    return PX_OK;
}

/* long bracket at s[i] ("[[", "[==["): returns its level or -1 */
static int long_level(const char *s, size_t n, size_t i)
{
    if (i >= n || s[i] != '[') return -1;
    size_t j = i + 1;
    int lvl = 0;
    while (j < n && s[j] == '=') lvl++, j++;
    return (j < n && s[j] == '[') ? lvl : -1;
}

/* skips a long bracket body starting at s[i] (the opening '['); counts lines */
static size_t skip_long(const char *s, size_t n, size_t i, int lvl, int *line, size_t *body,
                        size_t *body_len)
{
    i += (size_t)lvl + 2;
    *body = i;
    while (i < n) {
        if (s[i] == '\n') (*line)++;
        if (s[i] == ']') {
            size_t j = i + 1;
            int k = 0;
            while (j < n && s[j] == '=') k++, j++;
            if (k == lvl && j < n && s[j] == ']') {
                *body_len = i - *body;
                return j + 1;
            }
        }
        i++;
    }
    *body_len = n - *body;
    return n;
}

int pxd_tokenize(pxd_file *f)
{
    const char *s = f->text;
    size_t n = f->len, i = 0, cap = 0;
    int line = 1;
    while (i < n) {
        char c = s[i];
        if (c == '\n') {
            line++;
            i++;
        } else if (isspace((unsigned char)c)) {
            i++;
        } else if (c == '-' && i + 1 < n && s[i + 1] == '-') {
            int lvl = long_level(s, n, i + 2);
            if (lvl >= 0) {
                size_t b, bl;
                i = skip_long(s, n, i + 2, lvl, &line, &b, &bl);
            } else {
                while (i < n && s[i] != '\n') i++;
            }
        } else if (isalpha((unsigned char)c) || c == '_') {
            size_t j = i;
            while (j < n && (isalnum((unsigned char)s[j]) || s[j] == '_')) j++;
            pxd_tok t = {PXD_TOK_NAME, line, i, j - i, 0, 0};
            if (push_tok(f, &cap, t)) return PX_ENOMEM;
            i = j;
        } else if (c == '"' || c == '\'') {
            pxd_tok t = {PXD_TOK_STRING, line, i + 1, 0, 0, 0};
            size_t j = i + 1;
            while (j < n && s[j] != c && s[j] != '\n') {
                if (s[j] == '\\') {
                    t.escaped = 1;
                    if (j + 1 < n && s[j + 1] == '\n') line++;
                    j++;
                }
                j++;
            }
            t.len = (j < n ? j : n) - t.start;
            if (push_tok(f, &cap, t)) return PX_ENOMEM;
            i = j < n ? j + 1 : n;
        } else if (c == '[' && long_level(s, n, i) >= 0) {
            pxd_tok t = {PXD_TOK_STRING, line, 0, 0, 0, 0};
            i = skip_long(s, n, i, long_level(s, n, i), &line, &t.start, &t.len);
            if (push_tok(f, &cap, t)) return PX_ENOMEM;
        } else if (isdigit((unsigned char)c) || (c == '.' && i + 1 < n && isdigit((unsigned char)s[i + 1]))) {
            size_t j = i;
            while (j < n && (isalnum((unsigned char)s[j]) || s[j] == '.' ||
                             ((s[j] == '+' || s[j] == '-') && j > i &&
                              (s[j - 1] == 'e' || s[j - 1] == 'E' || s[j - 1] == 'p' || s[j - 1] == 'P'))))
                j++;
            pxd_tok t = {PXD_TOK_OTHER, line, i, j - i, '0', 0};
            if (push_tok(f, &cap, t)) return PX_ENOMEM;
            i = j;
        } else {
            /* '==' is not an assignment: keep it as one token */
            size_t l = (c == '=' && i + 1 < n && s[i + 1] == '=') ? 2 : 1;
            pxd_tok t = {PXD_TOK_OTHER, line, i, l, l == 2 ? 'E' : c, 0};
            if (push_tok(f, &cap, t)) return PX_ENOMEM;
            i += l;
        }
    }
    return PX_OK;
}

static int tok_is(const pxd_file *f, size_t k, pxd_tok_kind kind, const char *text)
{
    if (k >= f->ntok || f->tok[k].kind != kind || f->tok[k].escaped) return 0;
    size_t l = strlen(text);
    return f->tok[k].len == l && memcmp(f->text + f->tok[k].start, text, l) == 0;
}

static int tok_ch(const pxd_file *f, size_t k, char c)
{
    return k < f->ntok && f->tok[k].kind == PXD_TOK_OTHER && f->tok[k].ch == c;
}

static int cmp_strtok(const void *a, const void *b)
{
    const pxd_strtok *x = a, *y = b;
    size_t n = x->len < y->len ? x->len : y->len;
    int c = memcmp(x->s, y->s, n);
    if (c) return c;
    if (x->len != y->len) return x->len < y->len ? -1 : 1;
    return (x->tok > y->tok) - (x->tok < y->tok);
}

static long field_in(const pxd_file *f, long open, long close, const char *name, size_t nlen);
static long returned_table(const pxd_file *f);

/* Builds, once per file, the sorted string-token indexes and the list of
 * species tables, so each species is located in O(log n) rather than by a
 * scan of every token (13,000 species took 53 s). */
static int build_index(pxd_file *f)
{
    if (f->indexed) return f->indexed > 0;
    f->indexed = -1;
    size_t n = f->ntok ? f->ntok : 1;
    f->ftok = px_alloc(NULL, n * sizeof *f->ftok);
    f->stok = px_alloc(NULL, n * sizeof *f->stok);
    f->list_tables = px_alloc(NULL, n * sizeof *f->list_tables);
    if (!f->ftok || !f->stok || !f->list_tables) {
        f->oom = 1;
        return 0;
    }
    for (size_t i = 0; i < f->ntok; i++) {
        const pxd_tok *t = &f->tok[i];
        if (t->kind != PXD_TOK_STRING || t->escaped) continue;
        pxd_strtok st = {f->text + t->start, t->len, i};
        f->stok[f->n_stok++] = st;
        if (i >= 2 && tok_ch(f, i - 1, '=') && tok_is(f, i - 2, PXD_TOK_NAME, "formula"))
            f->ftok[f->n_ftok++] = st;
    }
    qsort(f->stok, f->n_stok, sizeof *f->stok, cmp_strtok);
    qsort(f->ftok, f->n_ftok, sizeof *f->ftok, cmp_strtok);
    /* the table constructors at depth 2 of a literal `species = { ... }` */
    long r = returned_table(f);
    long t = r < 0 ? -1 : field_in(f, r, (long)f->ntok - 1, "species", 7);
    if (t >= 0 && tok_ch(f, (size_t)t + 2, '{')) {
        int depth = 0;
        for (size_t i = (size_t)t + 2; i < f->ntok; i++) {
            if (tok_ch(f, i, '{')) {
                if (++depth == 2) f->list_tables[f->n_list_tables++] = (long)i;
            } else if (tok_ch(f, i, '}') && --depth == 0) {
                break;
            }
        }
    }
    f->indexed = 1;
    return 1;
}

/* the k-th (0-based, in source order) token of IDX whose contents are RAW */
static long nth_token(const pxd_strtok *idx, size_t n, const char *raw, int k)
{
    pxd_strtok key = {raw, strlen(raw), 0};
    size_t lo = 0, hi = n;
    while (lo < hi) {
        size_t mid = lo + (hi - lo) / 2;
        if (cmp_strtok(&idx[mid], &key) < 0) lo = mid + 1;
        else hi = mid;
    }
    size_t at = lo + (size_t)k;
    if (k < 0 || at >= n || idx[at].len != key.len || memcmp(idx[at].s, raw, key.len) != 0) return -1;
    return (long)idx[at].tok;
}

/* index of the k-th (0-based) `formula = "raw"` string token, or of the k-th
 * string literal "raw" if there is no such assignment; -1 if none */
static long find_formula_tok(const pxd_file *f, const char *raw, int k)
{
    long t = nth_token(f->ftok, f->n_ftok, raw, k);
    return t >= 0 ? t : nth_token(f->stok, f->n_stok, raw, k);
}

/* the INDEX-th (1-based) table constructor of a literal `species = { ... }` */
static long nth_in_species_list(const pxd_file *f, int index)
{
    if (index < 1 || (size_t)index > f->n_list_tables) return -1;
    return f->list_tables[index - 1];
}

static size_t hash_raw(const char *s)
{
    size_t h = 2166136261u; /* FNV-1a */
    for (; *s; s++) h = (h ^ (unsigned char)*s) * 16777619u;
    return h;
}

/* how many entries located before E carry E's raw text (then counts E) */
static int earlier_same_raw(pxd_file *f, const pxd_entry *e)
{
    if (f->n_raws * 2 >= f->cap_raws) { /* grow the open-addressing table */
        size_t cap = f->cap_raws ? 2 * f->cap_raws : 64;
        pxd_rawcount *t = px_calloc(NULL, cap, sizeof *t);
        if (!t) {
            f->oom = 1;
            return 0;
        }
        for (size_t i = 0; i < f->cap_raws; i++) {
            if (!f->raws[i].used) continue;
            size_t h = hash_raw(f->e[f->raws[i].entry].raw) & (cap - 1);
            while (t[h].used) h = (h + 1) & (cap - 1);
            t[h] = f->raws[i];
        }
        px_free(NULL, f->raws);
        f->raws = t;
        f->cap_raws = cap;
    }
    size_t h = hash_raw(e->raw) & (f->cap_raws - 1);
    while (f->raws[h].used && strcmp(f->e[f->raws[h].entry].raw, e->raw) != 0)
        h = (h + 1) & (f->cap_raws - 1);
    if (!f->raws[h].used) {
        f->raws[h] = (pxd_rawcount){(size_t)(e - f->e), 0, 1};
        f->n_raws++;
    }
    return f->raws[h].count++;
}

void pxd_index_free(pxd_file *f)
{
    px_free(NULL, f->ftok);
    px_free(NULL, f->stok);
    px_free(NULL, f->list_tables);
    px_free(NULL, f->raws);
    px_free(NULL, f->names);
    f->ftok = f->stok = NULL;
    f->list_tables = NULL;
    f->raws = NULL;
    f->names = NULL;
}

void pxd_locate_species(pxd_file *f, pxd_entry *e)
{
    e->tok_open = e->tok_close = -1;
    e->line_fallback = 0;
    if (!build_index(f)) return;
    long open = -1;
    if (e->raw[0] != '#') {
        int k = earlier_same_raw(f, e); /* how many earlier species carry the same text */
        long t = find_formula_tok(f, e->raw, k);
        if (t >= 0) e->line_fallback = f->tok[t].line;
        int depth = 0;
        for (long i = t - 1; t >= 0 && i >= 0; i--) {
            if (tok_ch(f, (size_t)i, '}')) depth++;
            else if (tok_ch(f, (size_t)i, '{') && depth-- == 0) {
                open = i;
                break;
            }
        }
    }
    if (open < 0) open = nth_in_species_list(f, e->index);
    if (open < 0) return;
    int depth = 0;
    long close = (long)f->ntok - 1;
    for (size_t i = (size_t)open; i < f->ntok; i++) {
        if (tok_ch(f, i, '{')) depth++;
        else if (tok_ch(f, i, '}') && --depth == 0) {
            close = (long)i;
            break;
        }
    }
    e->tok_open = (int)open;
    e->tok_close = (int)close;
}

int pxd_species_line(const pxd_file *f, const pxd_entry *e)
{
    return e->tok_open >= 0 ? f->tok[e->tok_open].line : e->line_fallback;
}

/* first `name =` at depth 1 inside the table opened at token OPEN */
static long field_in(const pxd_file *f, long open, long close, const char *name, size_t nlen)
{
    int depth = 0;
    for (long i = open; i <= close && i < (long)f->ntok; i++) {
        if (tok_ch(f, (size_t)i, '{')) depth++;
        else if (tok_ch(f, (size_t)i, '}')) depth--;
        else if (depth == 1 && f->tok[i].kind == PXD_TOK_NAME && f->tok[i].len == nlen &&
                 memcmp(f->text + f->tok[i].start, name, nlen) == 0 && tok_ch(f, (size_t)i + 1, '='))
            return i;
    }
    return -1;
}

static int field_line_in(const pxd_file *f, long open, long close, const char *field)
{
    while (open >= 0) {
        const char *dot = strchr(field, '.');
        size_t l = dot ? (size_t)(dot - field) : strlen(field);
        long t = field_in(f, open, close, field, l);
        if (t < 0) return 0;
        if (!dot) return f->tok[t].line;
        /* descend into `name = { ... }` */
        if (!tok_ch(f, (size_t)t + 2, '{')) return f->tok[t].line;
        long o = t + 2, c = o;
        for (int d = 0; c < (long)f->ntok; c++) {
            if (tok_ch(f, (size_t)c, '{')) d++;
            else if (tok_ch(f, (size_t)c, '}') && --d == 0) break;
        }
        int sub = field_line_in(f, o, c, dot + 1);
        return sub > 0 ? sub : f->tok[t].line;
    }
    return 0;
}

int pxd_field_line(const pxd_file *f, const pxd_entry *e, const char *field)
{
    if (e->tok_open < 0) return 0;
    return field_line_in(f, e->tok_open, e->tok_close, field);
}

/* the returned table: the `{` after the last `return` */
static long returned_table(const pxd_file *f)
{
    for (size_t i = f->ntok; i-- > 0;)
        if (tok_is(f, i, PXD_TOK_NAME, "return") && tok_ch(f, i + 1, '{')) return (long)i + 1;
    return -1;
}

/* a top-level field (`element =`, `units.energy`) of the returned table: the
 * first `name =` outside any species table; "return" finds the return keyword */
int pxd_toplevel_line(const pxd_file *f, const char *field)
{
    if (!field || !*field) return 0;
    if (strcmp(field, "return") == 0) {
        for (size_t i = f->ntok; i-- > 0;)
            if (tok_is(f, i, PXD_TOK_NAME, "return")) return f->tok[i].line;
        return 0;
    }
    long open = returned_table(f);
    if (open >= 0) {
        int l = field_line_in(f, open, (long)f->ntok - 1, field);
        if (l > 0) return l;
    }
    const char *dot = strchr(field, '.');
    size_t l = dot ? (size_t)(dot - field) : strlen(field);
    for (size_t i = 0; i + 1 < f->ntok; i++)
        if (f->tok[i].kind == PXD_TOK_NAME && f->tok[i].len == l &&
            memcmp(f->text + f->tok[i].start, field, l) == 0 && tok_ch(f, i + 1, '='))
            return f->tok[i].line;
    return 0;
}

/* line of the first string literal S between tokens FROM and TO (TO < 0: end) */
int pxd_string_line(const pxd_file *f, const char *s, int from_tok, int to_tok)
{
    size_t end = to_tok < 0 ? f->ntok : (size_t)to_tok + 1;
    for (size_t i = from_tok < 0 ? 0 : (size_t)from_tok; i < end && i < f->ntok; i++)
        if (tok_is(f, i, PXD_TOK_STRING, s)) return f->tok[i].line;
    return 0;
}
