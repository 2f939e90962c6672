/* data.h - element definition files: sandboxed loading, validation, user
 * overrides.
 *
 * An element definition file is a plain Lua chunk that returns one table
 * (format: docs/element-files.md).  Files are shared between researchers, so
 * a file is never trusted: it runs in its own small lua_State with a capped
 * allocator, an instruction budget that re-arms itself (so the file's own
 * pcall cannot swallow it), text-only loading (no precompiled chunks) and an
 * environment of pure helpers only.  The returned table is copied into C
 * px_species records (every unit converted once, to the internal SI units of
 * species.h) and the Lua state is closed before anything reaches a px_db.
 *
 * Problems are collected in a px_data_problems list, each with file, line,
 * species, field and message, and render as
 *     file:line: species: field: message
 *     file:line: species: warning: field: message
 * A file with any error adds nothing to the database (all or nothing).
 *
 * The functions never print (except px_data_problems_write and
 * px_data_list_write, which write to the stream the caller gives). */
#ifndef PX_DATA_H
#define PX_DATA_H
#include <stddef.h>
#include <stdio.h>
#include "thermo/species.h"
#include "thermo/thermo.h"

/* ---- problems (diagnostics) ------------------------------------------- */

typedef enum px_data_severity {
    PX_DATA_ERROR = 0,  /* the file (or the species) is rejected */
    PX_DATA_WARNING = 1 /* loaded, but worth a look */
} px_data_severity;

typedef struct px_data_problem {
    px_data_severity severity;
    char *file;    /* display name of the file, never NULL */
    int line;      /* 1-based line, 0 if unknown */
    char *species; /* formula as written in the file, "" for file-level problems */
    char *field;   /* e.g. "G", "hkf.a2", "units.energy", "" if none */
    char *message; /* lower-case sentence without trailing period */
} px_data_problem;

typedef struct px_data_problems px_data_problems; /* opaque, growable list */

px_data_problems *px_data_problems_new(void);
void px_data_problems_free(px_data_problems *p); /* NULL ok */
void px_data_problems_clear(px_data_problems *p);
size_t px_data_problems_count(const px_data_problems *p);
size_t px_data_problems_errors(const px_data_problems *p);   /* severity ERROR */
size_t px_data_problems_warnings(const px_data_problems *p); /* severity WARNING */
const px_data_problem *px_data_problems_get(const px_data_problems *p, size_t i);
/* Renders one problem as one line (no newline), snprintf-style: returns the
 * length the full text needs; writes at most size bytes including the NUL. */
int px_data_problem_format(const px_data_problem *pr, char *buf, size_t size);
/* Writes every problem, one line each, to OUT.  Returns the number of errors. */
size_t px_data_problems_write(const px_data_problems *p, FILE *out);

/* ---- options ------------------------------------------------------------ */

#define PX_DATA_MEM_LIMIT_DEFAULT ((size_t)8 << 20) /* bytes held by the sandbox */
#define PX_DATA_INSTR_LIMIT_DEFAULT 20000000UL      /* Lua VM instructions per file (and
                                                      units of work charged by helpers) */
#define PX_DATA_WALL_LIMIT_DEFAULT 30.0             /* seconds per file (a guard for work the
                                                      budget does not see; slow machines) */
/* dfG vs dfH - T dfS mismatch that is an error, J/mol (docs/element-files.md,
 * "Consistency"; common practice, no source) */
#define PX_DATA_CONSISTENCY_TOL_DEFAULT 1500.0
/* |dfG| or |dfH| per atom above which a unit slip is suspected (warning), J/mol
 * (common practice, no source: no species known to us exceeds ~1000 kJ/mol/atom) */
#define PX_DATA_MAGNITUDE_WARN_DEFAULT 1.2e6
/* a species may declare `known_mismatch = "<why>"` (a published table that
 * does not close its own cycle): mismatches up to this are then warnings, J/mol
 * (common practice, no source: larger ones are slips, not table spread) */
#define PX_DATA_KNOWN_MISMATCH_MAX 5000.0

typedef struct px_data_options {
    size_t mem_limit;          /* sandbox allocator cap, bytes */
    unsigned long instr_limit; /* instruction budget, Lua VM instructions */
    double wall_limit;         /* seconds of wall-clock time per file */
    double consistency_tol;    /* J/mol; INFINITY switches the check off */
    double magnitude_warn;     /* J/mol per atom; INFINITY switches it off */
    int user_file;             /* user override file: `element` optional, `exclude`
                                  allowed, species replace same-formula ones */
    const int *elements;       /* if not NULL: load only species made of these
                                  elements (atomic numbers) plus H and O; others are
                                  skipped silently (complexes of unloaded metals) */
    size_t n_elements;
} px_data_options;

px_data_options px_data_options_default(void);

/* ---- loading -------------------------------------------------------------- */

/* Runs TEXT (LEN bytes) in the sandbox, validates it (the same rules as
 * px_data_check_buffer) and, if there is no error, adds every species to DB
 * (px_db_add: a formula already in DB is an error).  NAME is the file name
 * used in problems and stored in px_species.file.  OPT NULL means defaults;
 * PROBS may be NULL.
 * Returns PX_OK (warnings possible), PX_EDATA (invalid data), PX_EPARSE (Lua
 * syntax error), PX_ELIMIT (instruction budget or memory cap exceeded),
 * PX_ENOMEM, PX_EINVAL (bad arguments).  On failure DB is unchanged. */
int px_data_load_buffer(px_db *db, const char *text, size_t len, const char *name,
                        const px_data_options *opt, px_data_problems *probs);
/* Same for a file on disk (PX_EIO if it cannot be read; PX_ELIMIT if larger
 * than PX_DATA_FILE_MAX). */
#define PX_DATA_FILE_MAX ((size_t)4 << 20)
/* Reads a whole file for loading: regular files only, at most
 * PX_DATA_FILE_MAX bytes, NUL-terminated (free() it).  PX_EIO (cannot open,
 * not a regular file, read error) or PX_ELIMIT (too large), with MSG set. */
int px_data_read_file(const char *path, char **text, size_t *len, char *msg, size_t msgsize);
int px_data_load_file(px_db *db, const char *path, const px_data_options *opt,
                      px_data_problems *probs);
/* Loads the embedded standard-library file stdlib/elements/<ELEMENT>.lua
 * (PX_ENOTFOUND if there is none). */
int px_data_load_embedded(px_db *db, const char *element, const px_data_options *opt,
                          px_data_problems *probs);

/* The ligand files in their order (docs/element-files.md, "Where species
 * go"): a species with several ligands belongs in the first one's file, and
 * ligand files load after the metals' in this order (Cl, S, C, N, P, F).
 * The one home of the order: phlox.library asks for it (core.ligand_order).
 * px_data_ligand_z: atomic number of the i-th ligand (0-based), 0 past the
 * end; px_data_ligand_rank: the rank of element z, -1 if z is no ligand. */
int px_data_ligand_z(size_t i);
int px_data_ligand_rank(int z);

/* User overrides: a file whose species are added or replace species with the
 * same (canonical) formula in DB, and whose file-level `exclude = {...}` list
 * removes species from DB (excludes are applied first).  `element` may be
 * omitted.  All or nothing, like px_data_load_buffer. */
int px_data_merge_user_buffer(px_db *db, const char *text, size_t len, const char *name,
                              const px_data_options *opt, px_data_problems *probs);
int px_data_merge_user_file(px_db *db, const char *path, const px_data_options *opt,
                            px_data_problems *probs);

/* ---- checking --------------------------------------------------------------- */

/* Validates one file without changing anything: sandbox errors, fields, types,
 * units, formulas, charges, element membership, duplicates, dfG/dfH/S
 * consistency, reaction balance.  KNOWN (may be NULL) holds species defined
 * elsewhere: a duplicate of one of them is an error, and logk reactants found
 * neither in the file nor in KNOWN are warned about only when KNOWN is given.
 * Returns PX_OK if there is no error, else the code px_data_load_buffer would. */
int px_data_check_buffer(const px_db *known, const char *text, size_t len, const char *name,
                         const px_data_options *opt, px_data_problems *probs);
int px_data_check_file(const px_db *known, const char *path, const px_data_options *opt,
                       px_data_problems *probs);
/* `phlox check FILE...` in one call: checks the files in order; each sees the
 * built-in species and the species of the earlier files (so Cl.lua after
 * Zn.lua finds Zn^2+).  Returns PX_OK if no file has an error, else the first
 * failure code. */
int px_data_check_files(const char *const *paths, size_t n, const px_data_options *opt,
                        px_data_problems *probs);

/* ---- listing -------------------------------------------------------------- */

/* `phlox list [ELEMENT]`: one line per species of DB containing ELEMENT (all if
 * NULL or ""): formula, model, dfG kJ/mol (or log K), file:line, source.
 * Returns the number of species written. */
size_t px_data_list_write(const px_db *db, const char *element, FILE *out);
/* The citations of keys the database's records cite but its references
 * lack (the built-in species'), from the standard bibliography
 * (stdlib/bibliography.lua).  PX_ENOTFOUND if a key is not there. */
int px_data_cite_builtins(px_db *db);

#endif
