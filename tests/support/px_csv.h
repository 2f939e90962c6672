/* px_csv.h - CSV reading for the C unit tests (tests/reference files).
 *
 * RFC 4180 quoting on one line: a field in double quotes may hold commas
 * and "" for a quote; the line end (LF or CR LF) is dropped.
 *   px_csv_next(fp, &row)          the next line split in place into
 *                                  row.f[0..row.n-1]; 0 at the end of file
 *   px_csv_col(&header, "name")    the column's index; fails the test,
 *                                  naming the column, when there is none
 *   px_ref_value(file, keycol, key, valcol)
 *                                  strtod of valcol in the first row of the
 *                                  reference file whose keycol is key; fails
 *                                  the test naming file and key when none
 *   px_ref_E0(couple)              E0 (V vs SHE, 25 C) of the couple in
 *                                  standard_potentials.csv
 *   px_ref_logk(reaction)          log10 K (25 C) of the reaction in
 *                                  log_k_25C.csv
 * Needs px_test.h (cmocka and px_ref_open) first. */
#ifndef PX_TEST_CSV_H
#define PX_TEST_CSV_H
#include <stdlib.h>
#include <string.h>

#define PX_CSV_MAXF 32
typedef struct px_csv_row {
    char buf[4096];
    char *f[PX_CSV_MAXF];
    int n;
} px_csv_row;

static inline int px_csv_next(FILE *fp, px_csv_row *r)
{
    if (!fgets(r->buf, sizeof r->buf, fp)) return 0;
    size_t len = strlen(r->buf);
    while (len && (r->buf[len - 1] == '\n' || r->buf[len - 1] == '\r')) r->buf[--len] = '\0';
    r->n = 0;
    char *p = r->buf;
    while (r->n < PX_CSV_MAXF) {
        char *out = p, *start = p;
        int q = 0;
        if (*p == '"') {
            q = 1;
            p++;
        }
        while (*p) {
            if (q && *p == '"' && p[1] == '"') {
                *out++ = '"';
                p += 2;
                continue;
            }
            if (q && *p == '"') {
                q = 0;
                p++;
                continue;
            }
            if (!q && *p == ',') break;
            *out++ = *p++;
        }
        int end = *p == '\0';
        *out = '\0';
        r->f[r->n++] = start;
        if (end) break;
        p++;
    }
    return 1;
}

static inline int px_csv_col_impl(const px_csv_row *hdr, const char *name, const char *file,
                                  int line)
{
    for (int i = 0; i < hdr->n; i++)
        if (!strcmp(hdr->f[i], name)) return i;
    print_error("no column %s\n", name);
    _fail(file, line);
    return -1;
}
#define px_csv_col(hdr, name) px_csv_col_impl((hdr), (name), __FILE__, __LINE__)

#ifdef PHLOX_REFERENCE_DIR
static inline double px_ref_value_impl(const char *rel, const char *keycol, const char *key,
                                       const char *valcol, const char *file, int line)
{
    FILE *fp = px_ref_open_impl(rel, file, line);
    px_csv_row hdr, r;
    double v = NAN;
    if (px_csv_next(fp, &hdr)) {
        int ck = px_csv_col_impl(&hdr, keycol, file, line);
        int cv = px_csv_col_impl(&hdr, valcol, file, line);
        while (px_csv_next(fp, &r))
            if (r.n > ck && r.n > cv && strcmp(r.f[ck], key) == 0) {
                v = strtod(r.f[cv], NULL);
                break;
            }
    }
    fclose(fp);
    if (!isfinite(v)) {
        print_error("no row '%s' with a value of %s in %s\n", key, valcol, rel);
        _fail(file, line);
    }
    return v;
}
#define px_ref_value(rel, keycol, key, valcol) \
    px_ref_value_impl((rel), (keycol), (key), (valcol), __FILE__, __LINE__)
#define px_ref_E0(couple) px_ref_value("standard_potentials.csv", "couple", (couple), "E0_V_SHE_25C")
#define px_ref_logk(reaction) px_ref_value("log_k_25C.csv", "reaction", (reaction), "log10_K_25C")
#endif

#endif
