/* data_internal.h - private types shared by the files of src/data/.
 *
 * A file goes through four stages, each in its own source file:
 *   sandbox.c  run the chunk in a fresh, capped lua_State, get its table
 *   read.c     walk that table (inside a protected call) into pxd_entry
 *              records, converting units once; type and field errors
 *   lines.c    a small tokenizer of the source text, to give each species
 *              and field a line number without the debug library
 *   check.c    rules that need the whole file: duplicates, element
 *              membership, dfG/dfH/S consistency, reaction balance
 * load.c drives them and talks to the px_db; problems.c is the diagnostics
 * list. */
#ifndef PX_DATA_INTERNAL_H
#define PX_DATA_INTERNAL_H
#include "data/data.h"
#include <stdarg.h>
#include <stddef.h>

#define PXD_RAW_MAX 96 /* bytes of a formula as written, with NUL */
#define PXD_KOPP_MAX 4 /* components of a Kopp-Neumann estimate (estimate.from) */

typedef struct pxd_entry {
    px_species sp;          /* sp.source and sp.file owned (malloc) */
    char raw[PXD_RAW_MAX];  /* formula as written ("#3" if missing) */
    int index;              /* 1-based position in the species list */
    int tok_open, tok_close;/* token range of the species table, -1 if unknown */
    int line_fallback;      /* line of the formula literal when no table encloses it */
    int formula_ok;         /* px_formula_parse succeeded */
    int errors;             /* errors reported against this species */
    int has_G, has_H, has_S;
    int want_estimate;      /* hkf from correlations: est_Cp (J/(mol K)), est_V (cm3/mol or NAN) */
    double est_Cp, est_V;
    int has_logK, has_logK_T; /* logk: which forms were given */
    double logK_given;
    int skip;               /* outside the requested element set */
    int known_mismatch;     /* `known_mismatch = "..."` given: cycle mismatch is a warning */
    int want_kopp;          /* cp from Kopp-Neumann additivity over kopp_from (resolved in check) */
    int n_kopp;
    char kopp_from[PXD_KOPP_MAX][PXD_RAW_MAX]; /* component formulas as written, sorted */
    double kopp_nu[PXD_KOPP_MAX];
} pxd_entry;

/* A publication a file defines in its `sources` table (or the standard
 * bibliography, stdlib/bibliography.lua, defines in its own). */
typedef struct pxd_ref {
    char key[PX_REF_KEY_MAX];
    char *short_text; /* owned; the key itself if none was given */
    char *cite;       /* owned */
    int line;
    int cited;        /* some species of the file cites it */
} pxd_ref;

typedef struct pxd_exclude {
    char raw[PXD_RAW_MAX];
    int line;
} pxd_exclude;

typedef enum { PXD_TOK_NAME, PXD_TOK_STRING, PXD_TOK_OTHER } pxd_tok_kind;
typedef struct pxd_tok {
    pxd_tok_kind kind;
    int line;
    size_t start, len; /* into the source text; for strings: the contents */
    char ch;           /* for OTHER: the first character ('{', '}', '=', ...) */
    int escaped;       /* string contains a backslash escape (contents not literal) */
} pxd_tok;

typedef struct pxd_file {
    const char *name;  /* display name (borrowed) */
    const char *text;  /* source (borrowed) */
    size_t len;
    const px_data_options *opt;
    px_data_problems *probs; /* never NULL (a private list if the caller gave none) */
    size_t n_errors;         /* errors reported for this file */
    int oom;                 /* host allocation failed */
    int status;              /* first failure code (PX_EPARSE, PX_ELIMIT, PX_EDATA) */

    char element[8];   /* "" if none */
    int element_z;     /* 0 if none / "HO" */
    int element_ho;    /* element = "HO": the water file */
    double Tmin, Tmax; /* file-level defaults */
    double e_unit, s_unit; /* file-level unit factors to J, J/K */
    int has_species;

    pxd_entry *e;
    size_t n, cap;
    pxd_exclude *ex;
    size_t n_ex, cap_ex;
    pxd_ref *refs;     /* the file's `sources`, sorted by key */
    size_t n_refs;
    int bibliography;  /* the file holds `sources` only (no element, no species) */
    const px_db *known;/* species (and references) loaded before; may be NULL */

    pxd_tok *tok;
    size_t ntok;

    /* indexes that keep the loader linear in the number of species
     * (lines.c and check.c build them once per file) */
    struct pxd_name *names;   /* formula-ok entries by canonical formula */
    size_t n_names;
    struct pxd_strtok *ftok;  /* `formula = "..."` string tokens by contents */
    size_t n_ftok;
    struct pxd_strtok *stok;  /* every plain string token by contents */
    size_t n_stok;
    long *list_tables;        /* the tables of a literal `species = { ... }` list */
    size_t n_list_tables;
    int indexed;              /* token indexes built (or failed: -1) */
    struct pxd_rawcount *raws;/* raw formula -> entries located so far */
    size_t cap_raws, n_raws;
} pxd_file;

typedef struct pxd_name {
    const char *text;
    size_t index;
} pxd_name;
typedef struct pxd_strtok {
    const char *s;
    size_t len, tok;
} pxd_strtok;
typedef struct pxd_rawcount {
    size_t entry; /* an entry with this raw text (its raw[] is the key) */
    int count;
    int used;
} pxd_rawcount;
void pxd_index_free(pxd_file *f);

/* problems.c */
void pxd_report(pxd_file *f, px_data_severity sev, int line, const char *species,
                const char *field, const char *fmt, ...)
#if defined(__GNUC__)
    __attribute__((format(printf, 6, 7)))
#endif
    ;
/* Report against an entry: the line is the field's line if FIELD is found in
 * the species table, else the species' line. */
void pxd_report_entry(pxd_file *f, pxd_entry *e, px_data_severity sev, const char *field,
                      const char *fmt, ...)
#if defined(__GNUC__)
    __attribute__((format(printf, 5, 6)))
#endif
    ;

/* sandbox.c: runs f->text and calls pxd_read_table on its result. */
void pxd_sandbox_run(pxd_file *f);

/* read.c: lua_CFunction; upvalue 1 = light userdata pxd_file*, arg 1 = table */
struct lua_State;
int pxd_read_table(struct lua_State *L);

/* read.c: orders pxd_ref by key (f->refs is sorted with it) */
int pxd_ref_cmp(const void *a, const void *b);

/* load.c: the standard bibliography (stdlib/bibliography.lua, embedded),
 * read once per process; NULL if it failed to load (a build error). */
const pxd_file *pxd_stdlib_bibliography(void);
/* A key's citation: the file's own `sources` (marked cited), then the known
 * database's references, then the standard bibliography.  1 and the texts
 * (borrowed), or 0 if none has the key. */
int pxd_ref_lookup(pxd_file *f, const char *key, const char **short_text, const char **cite);

/* lines.c */
int pxd_tokenize(pxd_file *f);                     /* PX_OK or PX_ENOMEM */
void pxd_locate_species(pxd_file *f, pxd_entry *e); /* sets tok_open/tok_close */
int pxd_species_line(const pxd_file *f, const pxd_entry *e);
int pxd_field_line(const pxd_file *f, const pxd_entry *e, const char *field);
int pxd_toplevel_line(const pxd_file *f, const char *field);
int pxd_string_line(const pxd_file *f, const char *s, int from_tok, int to_tok);

/* check.c */
void pxd_check_file(pxd_file *f, const px_db *known);

/* unit factors */
#define PXD_KJ 1000.0      /* J per kJ */
#define PXD_KCAL 4184.0    /* J per kcal (thermochemical) */
#define PXD_CM3_TO_J_PER_BAR 0.1 /* 1 cm3 bar = 0.1 J */
/* default valid range when neither the species nor the file declares one:
 * phlox's water range (water.h, PX_WATER_TMIN/TMAX) */
#define PXD_TMIN_DEFAULT 273.15
#define PXD_TMAX_DEFAULT 623.15

char *pxd_strdup(const char *s);
void pxd_entry_free(pxd_entry *e);

#endif
