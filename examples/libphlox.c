/* libphlox.c - phlox's C library from a program of your own.
 *
 * Loads the built-in element library for zinc, prints the log K and the
 * standard potential of Zn^2+ + 2 e- = Zn(s) at 25 and 150 C (1 bar to
 * 100 C, saturation pressure above), the ionisation constant of water at
 * 25 C, and the speciation of 1e-5 mol/kg dissolved zinc held at pH 9 at
 * 25 and 150 C (solids suppressed, ideal activities).
 *
 * Build against an installed phlox:
 *     cc -std=c11 libphlox.c $(pkg-config --cflags --libs phlox) -o libphlox
 * Output: one "name = value" line per result. */
#include <phlox/phlox.h>
#include <stdio.h>
#include <string.h>

#define T_25C 298.15
#define T_150C 423.15
#define ZN_TOTAL 1e-5 /* mol/kg, an illustrative choice */
#define PH_FIXED 9.0

static int fail(const char *what, int st, const char *detail)
{
    fprintf(stderr, "libphlox: %s: %s%s%s\n", what, px_strerror(st), detail && *detail ? ": " : "",
            detail ? detail : "");
    return 1;
}

/* H2O(l), e-, the H/O species and the element file of zinc. */
static int load_library(px_db *db)
{
    int st = px_db_add_builtins(db);
    if (st < 0) return fail("built-in species", st, NULL);
    px_data_problems *probs = px_data_problems_new();
    const char *files[] = {"HO", "Zn"};
    for (size_t i = 0; i < sizeof files / sizeof files[0] && st >= 0; i++) {
        st = px_data_load_embedded(db, files[i], NULL, probs);
        if (st < 0) {
            fail(files[i], st, NULL);
            px_data_problems_write(probs, stderr);
        }
    }
    px_data_problems_free(probs);
    return st < 0;
}

static int reaction(px_thermo_ws *ws, const px_db *db, const char *text, double T, const char *tag)
{
    px_reaction r;
    char msg[256] = "";
    int st = px_reaction_parse_balanced(text, &r, msg, sizeof msg);
    if (st < 0) return fail(text, st, msg);
    double P;
    st = px_thermo_default_pressure(T, &P);
    if (st < 0) return fail("pressure", st, NULL);
    px_reaction_result res;
    st = px_reaction_props(ws, db, &r, T, P, &res);
    if (st < 0) return fail(text, st, px_thermo_ws_error(ws));
    printf("%s.logK = %.6f\n", tag, res.logK);
    if (res.n_e > 0) printf("%s.E_V = %.6f\n", tag, res.E);
    printf("%s.P_bar = %.6g\n", tag, P);
    return 0;
}

/* Speciate at T with the options given; prints pH and the species of
 * zinc (and OH^-, H^+) above 1e-12 mol/kg. */
static int speciate(px_thermo_ws *ws, const px_db *db, px_spec_options *o, const char *tag)
{
    char msg[512] = "";
    int st = px_thermo_default_pressure(o->T, &o->P);
    if (st < 0) return fail("pressure", st, NULL);
    px_spec *s = NULL;
    st = px_spec_build(ws, db, o, &s, msg, sizeof msg);
    if (st >= 0) st = px_spec_solve(s, &o->solver, msg, sizeof msg);
    if (st < 0) {
        px_spec_free(s);
        return fail(tag, st, msg);
    }
    for (size_t j = 0; j < s->n_species; j++) {
        px_equil_species_result r;
        if (px_equil_work_get_species(s->work, j, &r) < 0) continue;
        const px_species *sp = px_db_get(db, (size_t)s->db_index[j]);
        if (strcmp(sp->f.text, "H^+") == 0) printf("%s.pH = %.4f\n", tag, -r.log_activity);
        if (r.molality > 1e-12 && sp->f.state == PX_STATE_AQ &&
            (strchr(sp->f.text, 'Z') || strcmp(sp->f.text, "OH^-") == 0))
            printf("%s.m[%s] = %.4e\n", tag, sp->f.text, r.molality);
    }
    px_spec_free(s);
    return 0;
}

int main(void)
{
    printf("phlox.version = %s\n", PHLOX_VERSION_STRING);
    px_db *db = px_db_new();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    int bad = !db || !ws;
    if (bad) fputs("libphlox: out of memory\n", stderr);
    if (!bad) bad = load_library(db);
    if (!bad) printf("species = %zu\n", px_db_count(db));
    if (!bad) bad = reaction(ws, db, "Zn^2+ + 2 e- = Zn(s)", T_25C, "zn.25C");
    if (!bad) bad = reaction(ws, db, "Zn^2+ + 2 e- = Zn(s)", T_150C, "zn.150C");
    if (!bad) bad = reaction(ws, db, "H2O(l) = H^+ + OH^-", T_25C, "water.25C");

    for (int k = 0; k < 2 && !bad; k++) { /* dissolved zinc at a fixed pH */
        px_spec_options o = px_spec_options_default();
        o.T = k == 0 ? T_25C : T_150C;
        o.n_totals = 1;
        o.element[0] = "Zn";
        o.total[0] = ZN_TOTAL;
        o.ph_mode = PX_SPEC_PH_FIXED;
        o.pH = PH_FIXED;
        o.solids = 0;
        bad = speciate(ws, db, &o, k == 0 ? "zinc.25C" : "zinc.150C");
    }
    px_thermo_ws_free(ws);
    px_db_free(db);
    return bad ? 1 : 0;
}
