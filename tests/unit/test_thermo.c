/* test_thermo.c - reactions, the species database and the standard-state
 * models of src/thermo, checked against outside references:
 *   - tests/reference/hkf/hkf_parameters.csv: published Cp and V at 25 C
 *     of every HKF row with a complete parameter set (from memory of SH88,
 *     SHS89, Shock et al. 1997), with the papers' Born constants;
 *   - tests/reference/water.csv: pKw along saturation (IAPWS R11-07 via
 *     python3-iapws) against H2O(l), H^+ and OH^- of this module;
 *   - tests/reference/standard_potentials.csv: E at 25 C of couples, with
 *     species from tests/reference/gibbs_25C.csv (NBS 1982 rows);
 *   - tests/reference/log_k_25C.csv: Plummer and Busenberg 1982 analytic
 *     log K of CO2(aq) + H2O = HCO3^- + H^+ at 25 C;
 *   - finite differences: -dG/dT = S, dG/dP = V, -T d2G/dT2 = Cp (exact
 *     thermodynamic identities). */
#include "px_test.h"
#include "support/px_csv.h"

#include <stdlib.h>
#include <string.h>

#include "core/constants.h"
#include "core/status.h"
#include "thermo/thermo.h"

#define CAL PX_CAL

/* ------------------------------------------------------------ reactions */
static void test_reaction_parse(void **state)
{
    (void)state;
    px_reaction r;
    char msg[256];
    assert_int_equal(px_reaction_parse_balanced("Fe^3+ + e- = Fe^2+", &r, msg, sizeof msg), PX_OK);
    assert_int_equal(r.n, 3);
    assert_string_equal(r.sp[0].text, "Fe^3+");
    assert_close(r.nu[0], -1, 0, 0);
    assert_close(r.nu[1], -1, 0, 0);
    assert_close(r.nu[2], 1, 0, 0);
    assert_close(px_reaction_electrons(&r), 1, 0, 0);

    assert_int_equal(px_reaction_parse_balanced("2 H^+ + 2 e- = H2(g)", &r, msg, sizeof msg), PX_OK);
    assert_close(r.nu[0], -2, 0, 0);
    assert_close(px_reaction_electrons(&r), 2, 0, 0);
    assert_int_equal(px_reaction_parse_balanced("0.5 O2(g) + 2 H^+ + 2 e- = H2O(l)", &r, msg, sizeof msg), PX_OK);
    assert_close(r.nu[0], -0.5, 0, 1e-15);
    assert_int_equal(px_reaction_parse_balanced("1/2 O2(g) + H2(g) = H2O(l)", &r, msg, sizeof msg), PX_OK);
    assert_close(r.nu[0], -0.5, 0, 1e-15);
    /* no spaces around the separators; coefficient glued to the formula */
    assert_int_equal(px_reaction_parse_balanced("Fe^3++e-=Fe^2+", &r, msg, sizeof msg), PX_OK);
    assert_int_equal(px_reaction_parse_balanced("2H2O(l) = O2(g) + 4 H^+ + 4 e-", &r, msg, sizeof msg), PX_OK);
    assert_close(px_reaction_electrons(&r), -4, 0, 0);
    /* a species on both sides is netted */
    assert_int_equal(px_reaction_parse("H2O(l) + CO2(aq) = HCO3^- + H^+ + H2O(l) + H2O(l)", &r, msg, sizeof msg), PX_OK);
    assert_int_equal(r.n, 4);
    char buf[128];
    assert_int_equal(px_reaction_parse("Fe2O3(s) + 6 H^+ + 6 e- = 2 Fe(s) + 3 H2O(l)", &r, msg, sizeof msg), PX_OK);
    assert_int_equal(px_reaction_format(&r, buf, sizeof buf), PX_OK);
    assert_string_equal(buf, "Fe2O3(s) + 6 H^+ + 6 e- = 2 Fe(s) + 3 H2O(l)");
}

static void test_reaction_errors(void **state)
{
    (void)state;
    px_reaction r;
    char msg[256];
    /* element imbalance named with both sides (the project's message format) */
    assert_int_equal(px_reaction_parse_balanced("Fe2O3(s) + 6 H^+ = 2 Fe^3+ + 2 H2O(l)", &r, msg, sizeof msg), PX_EBALANCE);
    assert_non_null(strstr(msg, "H: left 6, right 4"));
    assert_non_null(strstr(msg, "O: left 3, right 2"));
    assert_null(strstr(msg, "charge"));
    assert_int_equal(px_reaction_parse_balanced("Fe^3+ = Fe^2+", &r, msg, sizeof msg), PX_EBALANCE);
    assert_non_null(strstr(msg, "charge: left 3, right 2"));
    assert_int_equal(px_reaction_parse_balanced("O2(g) + 4 H^+ + 3 e- = 2 H2O(l)", &r, msg, sizeof msg), PX_EBALANCE);
    assert_non_null(strstr(msg, "charge: left 1, right 0"));
    /* parse errors */
    assert_int_equal(px_reaction_parse("Fe^3+ + = Fe^2+", &r, msg, sizeof msg), PX_EPARSE);
    assert_non_null(strstr(msg, "missing"));
    assert_int_equal(px_reaction_parse("Fe^3+ + e- Fe^2+", &r, msg, sizeof msg), PX_EPARSE);
    assert_int_equal(px_reaction_parse("A(s) = B(s) = C(s)", &r, msg, sizeof msg), PX_EPARSE);
    assert_int_equal(px_reaction_parse("Fe^3+ + e-", &r, msg, sizeof msg), PX_EPARSE);
    assert_non_null(strstr(msg, "no '='"));
    assert_int_equal(px_reaction_parse("Fe^3+ + e- =", &r, msg, sizeof msg), PX_EPARSE);
    assert_int_equal(px_reaction_parse("Qq^3+ = Fe^2+", &r, msg, sizeof msg), PX_EPARSE);
    assert_non_null(strstr(msg, "unknown element 'Qq'"));
    assert_int_equal(px_reaction_parse("1/0 H^+ = H^+", &r, msg, sizeof msg), PX_EPARSE);
    assert_int_equal(px_reaction_parse("H2O(l) = H2O(l)", &r, msg, sizeof msg), PX_EPARSE);
}

/* ------------------------------------------------------------ database */
static px_species mk(const char *text, px_model m, double G, double H, double S)
{
    px_species s;
    px_species_init(&s);
    snprintf(s.f.text, sizeof s.f.text, "%s", text);
    s.model = m;
    s.dGf = G;
    s.dHf = H;
    s.S = S;
    s.source = (char *)"test";
    return s;
}

static void test_db(void **state)
{
    (void)state;
    px_db *db = px_db_new();
    assert_non_null(db);
    px_species a = mk("Zn^2+(aq)", PX_MODEL_CP, -147060, -153890, -112.1);
    assert_int_equal(px_db_add(db, &a), PX_OK);
    assert_int_equal(px_db_add(db, &a), PX_EINVAL); /* duplicate */
    px_species b = mk("Zn(s)", PX_MODEL_CP, 0, 0, 41.63);
    assert_int_equal(px_db_add(db, &b), PX_OK);
    assert_int_equal((int)px_db_count(db), 2);
    const px_species *f = px_db_find(db, "Zn^2+");
    assert_non_null(f);
    assert_string_equal(f->f.text, "Zn^2+");
    assert_int_equal(f->f.charge, 2);
    assert_true(f->source != a.source); /* copied */
    assert_string_equal(f->source, "test");
    a.dGf = -147203;
    assert_int_equal(px_db_replace(db, &a), PX_OK);
    assert_close(px_db_find(db, "Zn^2+")->dGf, -147203, 0, 0);
    assert_int_equal((int)px_db_count(db), 2);
    assert_int_equal(px_db_remove(db, "Zn^2+"), PX_OK);
    assert_null(px_db_find(db, "Zn^2+"));
    assert_int_equal(px_db_remove(db, "Zn^2+"), PX_ENOTFOUND);
    assert_non_null(px_db_find(db, "Zn(s)"));
    px_species bad = mk("Zn^2", PX_MODEL_CP, 0, 0, 0);
    assert_int_equal(px_db_add(db, &bad), PX_EPARSE);
    for (int i = 0; i < 300; i++) { /* growth and rehash */
        char t[32];
        snprintf(t, sizeof t, "C%dH%d(g)", i + 1, 2 * i + 2);
        px_species s = mk(t, PX_MODEL_CP, 0, 0, 0);
        assert_int_equal(px_db_add(db, &s), PX_OK);
    }
    assert_non_null(px_db_find(db, "C150H300(g)"));
    assert_int_equal(px_db_add_builtins(db), PX_OK);
    assert_int_equal(px_db_find(db, "H2O(l)")->model, PX_MODEL_WATER);
    assert_non_null(px_db_find(db, "e-"));
    px_db_free(db);
    px_db_free(NULL);
}

/* Name resolution (issue 13): a solid without its mineral name stands for
 * the only solid of that formula; otherwise the message lists candidates. */
static void test_db_resolve(void **state)
{
    (void)state;
    px_db *db = px_db_new();
    assert_non_null(db);
    const char *names[] = {"ZnO(s,zincite)", "PbO(s,litharge)", "PbO(s,massicot)", "Fe(OH)3(am)",
                           "FeO(OH)(s,goethite)", "Zn^2+"};
    for (size_t i = 0; i < sizeof names / sizeof names[0]; i++) {
        px_species s = mk(names[i], PX_MODEL_CP, 0, 0, 1);
        assert_int_equal(px_db_add(db, &s), PX_OK);
    }
    long k;
    char msg[512];
    assert_int_equal(px_db_resolve(db, "ZnO(s)", &k, msg, sizeof msg), PX_OK);
    assert_string_equal(px_db_get(db, (size_t)k)->f.text, "ZnO(s,zincite)");
    assert_int_equal(px_db_resolve(db, "ZnO(cr)", &k, msg, sizeof msg), PX_OK);
    assert_string_equal(px_db_get(db, (size_t)k)->f.text, "ZnO(s,zincite)");
    assert_int_equal(px_db_resolve(db, "Zn^2+(aq)", &k, msg, sizeof msg), PX_OK); /* canonical */
    assert_string_equal(px_db_get(db, (size_t)k)->f.text, "Zn^2+");
    /* two polymorphs: ambiguous, both named */
    assert_int_equal(px_db_resolve(db, "PbO(s)", &k, msg, sizeof msg), PX_ENOTFOUND);
    assert_int_equal(k, -1);
    assert_string_equal(msg, "PbO(s): 2 solids have this formula: did you mean PbO(s,litharge) or "
                             "PbO(s,massicot)?");
    /* "(cr)" does not stand for an amorphous solid */
    assert_int_equal(px_db_resolve(db, "Fe(OH)3(cr)", &k, msg, sizeof msg), PX_ENOTFOUND);
    assert_string_equal(msg, "Fe(OH)3(cr): not in the loaded data: did you mean Fe(OH)3(am)?");
    assert_int_equal(px_db_resolve(db, "Fe(OH)3(s)", &k, msg, sizeof msg), PX_OK);
    /* another state of the same formula is offered, not taken */
    assert_int_equal(px_db_resolve(db, "ZnO(aq)", &k, msg, sizeof msg), PX_ENOTFOUND);
    assert_string_equal(msg, "ZnO(aq): not in the loaded data: did you mean ZnO(s,zincite)?");
    assert_int_equal(px_db_resolve(db, "CuO(s)", &k, msg, sizeof msg), PX_ENOTFOUND);
    assert_string_equal(msg, "CuO(s): not in the loaded data (is its element loaded?)");
    assert_int_equal(px_db_resolve(db, "zn^2+", &k, msg, sizeof msg), PX_EPARSE);
    assert_non_null(strstr(msg, "did you mean Zn^2+?"));
    /* lists */
    const char *list[] = {"Zn^2+", "ZnO(s)"};
    assert_true(px_db_listed(db, list, 2, px_db_index(db, "ZnO(s,zincite)")));
    assert_false(px_db_listed(db, list, 2, px_db_index(db, "PbO(s,litharge)")));
    assert_int_equal(px_db_check_list(db, "exclude", list, 2, msg, sizeof msg), PX_OK);
    const char *bad[] = {"Zn^2+", "PbO(s)"};
    assert_int_equal(px_db_check_list(db, "exclude", bad, 2, msg, sizeof msg), PX_ENOTFOUND);
    assert_non_null(strstr(msg, "exclude: PbO(s): 2 solids"));
    px_db_free(db);
}

/* ------------------------------------------------------------ HKF table */
typedef struct hkf_row {
    px_species sp;
    int complete;
    char conf[16];
    double Cp_pub, V_pub; /* cal/(mol K), cm3/mol; NAN if blank */
} hkf_row;

static int load_hkf(hkf_row *rows, int max)
{
    FILE *fp = px_ref_open("hkf/hkf_parameters.csv");
    px_csv_row hdr, r;
    assert_true(px_csv_next(fp, &hdr));
    int ci[] = {px_csv_col(&hdr, "a1"), px_csv_col(&hdr, "a2"), px_csv_col(&hdr, "a3"), px_csv_col(&hdr, "a4"),
                px_csv_col(&hdr, "c1"), px_csv_col(&hdr, "c2"), px_csv_col(&hdr, "omega")};
    /* the papers' printed scaling (hkf/README.md) */
    const double scale[] = {0.1, 1e2, 1, 1e4, 1, 1e4, 1e5};
    int csp = px_csv_col(&hdr, "species"), cg = px_csv_col(&hdr, "dGf_cal_mol"), ch = px_csv_col(&hdr, "dHf_cal_mol"),
        cs = px_csv_col(&hdr, "S_cal_molK"), ccp = px_csv_col(&hdr, "Cp_25C_cal_molK"),
        cv = px_csv_col(&hdr, "V_25C_cm3_mol"), cc = px_csv_col(&hdr, "confidence"),
        csrc = px_csv_col(&hdr, "source");
    int n = 0;
    while (n < max && px_csv_next(fp, &r)) {
        if (r.n < hdr.n)
            continue;
        hkf_row *h = &rows[n];
        memset(h, 0, sizeof *h);
        h->sp = mk(r.f[csp], PX_MODEL_HKF, NAN, NAN, NAN);
        h->sp.source = NULL;
        (void)csrc;
        h->sp.dGf = *r.f[cg] ? atof(r.f[cg]) * CAL : NAN;
        h->sp.dHf = *r.f[ch] ? atof(r.f[ch]) * CAL : NAN;
        h->sp.S = *r.f[cs] ? atof(r.f[cs]) * CAL : NAN;
        double *dst[] = {&h->sp.hkf.a1, &h->sp.hkf.a2, &h->sp.hkf.a3, &h->sp.hkf.a4,
                         &h->sp.hkf.c1, &h->sp.hkf.c2, &h->sp.hkf.omega};
        h->complete = 1;
        for (int k = 0; k < 7; k++) {
            if (!*r.f[ci[k]])
                h->complete = 0;
            *dst[k] = atof(r.f[ci[k]]) * scale[k] * CAL;
        }
        h->Cp_pub = *r.f[ccp] ? atof(r.f[ccp]) : NAN;
        h->V_pub = *r.f[cv] ? atof(r.f[cv]) : NAN;
        snprintf(h->conf, sizeof h->conf, "%s", r.f[cc]);
        px_formula f;
        assert_int_equal(px_formula_parse(h->sp.f.text, &f), PX_OK);
        h->sp.f = f;
        n++;
    }
    fclose(fp);
    return n;
}

/* Every complete high/medium row reproduces its published Cp and V at 25 C
 * within 1 cal/(mol K) and 0.5 cm3/mol with the papers' Born constants
 * (hkf/README.md: the tolerance and the reason for the papers' constants).
 * Low rows (HPO4^2-: Cp fails, Al^3+: V fails) are printed, not asserted. */
static void test_hkf_table_cp_v(void **state)
{
    (void)state;
    hkf_row rows[64];
    int n = load_hkf(rows, 64);
    assert_true(n >= 36);
    px_water_state w;
    px_hkf_papers_water_25C(&w);
    int checked = 0;
    for (int i = 0; i < n; i++) {
        hkf_row *h = &rows[i];
        if (!h->complete)
            continue;
        px_thermo_props p;
        assert_int_equal(px_hkf_props(&h->sp.hkf, h->sp.f.charge, h->sp.dGf, h->sp.dHf,
                                      h->sp.S, &w, &w, 0, &p), PX_OK);
        double Cp = p.Cp / CAL, V = p.V * 10.0;
        int high = !strcmp(h->conf, "high") || !strcmp(h->conf, "medium");
        if (!high) {
            print_message("documented (confidence %s): %-8s Cp %.2f vs %.2f, V %.2f vs %.2f\n",
                          h->conf, h->sp.f.text, Cp, h->Cp_pub, V, h->V_pub);
            continue;
        }
        assert_close(Cp, h->Cp_pub, 0, 1.0);
        if (isfinite(h->V_pub))
            assert_close(V, h->V_pub, 0, 0.5);
        else /* CO3^2-: no independent V (README); the parameters give -5.02 */
            assert_close(V, -5.02, 0, 0.01);
        assert_close(p.S, h->sp.S, 0, 1e-9); /* at Tr, Pr S is the input S */
        assert_close(p.G, h->sp.dGf, 1e-12, 0);
        checked++;
    }
    assert_int_equal(checked, 22); /* hkf/README.md: 22 complete rows pass */
}

/* ------------------------------------------------------------ estimation */
static hkf_row *find_row(hkf_row *rows, int n, const char *name)
{
    for (int i = 0; i < n; i++)
        if (!strcmp(rows[i].sp.f.text, name))
            return &rows[i];
    print_error("row %s not found\n", name);
    fail();
    return NULL;
}

static void test_hkf_estimate(void **state)
{
    (void)state;
    hkf_row rows[64];
    int n = load_hkf(rows, 64);
    /* Fe^2+ was estimated with the SH88 correlations in Shock et al. 1997
     * (hkf/README.md): S, Cp and V give back its a1..a4, c1, c2, omega. */
    hkf_row *fe = find_row(rows, n, "Fe^2+");
    px_species e = fe->sp;
    memset(&e.hkf, 0, sizeof e.hkf);
    e.hkf.omega = fe->sp.hkf.omega; /* omega as published: check a, c */
    assert_int_equal(px_hkf_estimate(&e, fe->Cp_pub * CAL, fe->V_pub), PX_OK);
    assert_true(e.estimated);
    assert_close(e.hkf.a1, fe->sp.hkf.a1, 0.01, 0);
    assert_close(e.hkf.a2, fe->sp.hkf.a2, 0.01, 0);
    assert_close(e.hkf.a3, fe->sp.hkf.a3, 0.01, 0);
    assert_close(e.hkf.a4, fe->sp.hkf.a4, 0.01, 0);
    assert_close(e.hkf.c1, fe->sp.hkf.c1, 0.01, 0);
    assert_close(e.hkf.c2, fe->sp.hkf.c2, 0.01, 0);
    /* the estimate reproduces the input Cp and V with the papers' constants */
    px_water_state w;
    px_hkf_papers_water_25C(&w);
    px_thermo_props p;
    assert_int_equal(px_hkf_props(&e.hkf, 2, e.dGf, e.dHf, e.S, &w, &w, 0, &p), PX_OK);
    assert_close(p.Cp / CAL, fe->Cp_pub, 0, 1e-6);
    assert_close(p.V * 10, fe->V_pub, 0, 1e-6);

    /* omega-S correlation vs regressed ions not used for its intercepts:
     * within 5 % (stated tolerance; F^- misses by 6 %, documented) */
    static const char *ions[] = {"Cl^-", "OH^-", "NO3^-", "HCO3^-", "SO4^2-", "CO3^2-",
                                 "Na^+", "K^+", "Mg^2+", "Ca^2+"};
    for (size_t i = 0; i < sizeof ions / sizeof ions[0]; i++) {
        hkf_row *h = find_row(rows, n, ions[i]);
        px_species s = h->sp;
        s.hkf.omega = 0;
        assert_int_equal(px_hkf_estimate(&s, h->Cp_pub * CAL, NAN), PX_OK);
        print_message("omega(S) %-7s %.4g vs %.4g (%.1f %%)\n", ions[i], s.hkf.omega / CAL,
                      h->sp.hkf.omega / CAL, 100 * (s.hkf.omega / h->sp.hkf.omega - 1));
        assert_close(s.hkf.omega, h->sp.hkf.omega, 0.05, 0);
        assert_close(s.hkf.a1, 0, 0, 0); /* V unknown: a1..a4 zero */
    }
    /* neutral: O2(aq) and H2(aq) omega = -1514.4 S within 10 cal/mol */
    static const char *neutral[] = {"O2(aq)", "H2(aq)"};
    for (int i = 0; i < 2; i++) {
        hkf_row *h = find_row(rows, n, neutral[i]);
        px_species s = h->sp;
        s.hkf.omega = 0;
        assert_int_equal(px_hkf_estimate(&s, h->Cp_pub * CAL, h->V_pub), PX_OK);
        assert_close(s.hkf.omega / CAL, h->sp.hkf.omega / CAL, 0, 10);
    }
    /* charge 3 needs omega from a radius */
    px_species al = find_row(rows, n, "Al^3+")->sp;
    al.hkf.omega = 0;
    assert_int_equal(px_hkf_estimate(&al, -32.5 * CAL, -45.3), PX_EDATA);
    /* Born radius rule (Helgeson and Kirkham 1976; SH88) with Pauling crystal
     * radii (from memory of Pauling 1960): K+ 1.33, Ca2+ 0.99, Cl- 1.81 A */
    assert_close(px_hkf_omega_born(1, 1.33) / CAL, 0.1927e5, 0.002, 0);
    assert_close(px_hkf_omega_born(2, 0.99) / CAL, 1.2366e5, 0.002, 0);
    assert_close(px_hkf_omega_born(-1, 1.81) / CAL, 1.456e5, 0.002, 0);
}

/* ------------------------------------------------------------ with water */
static px_db *db_from_hkf(void)
{
    hkf_row rows[64];
    int n = load_hkf(rows, 64);
    px_db *db = px_db_new();
    for (int i = 0; i < n; i++)
        if (rows[i].complete) {
            rows[i].sp.source = (char *)"hkf_parameters.csv";
            assert_int_equal(px_db_add(db, &rows[i].sp), PX_OK);
        }
    assert_int_equal(px_db_add_builtins(db), PX_OK);
    /* H2(g): NBS 1982 S; Kelley 1960 Cp (from memory), as stdlib/elements/HO.lua */
    px_species h2 = mk("H2(g)", PX_MODEL_CP, 0, 0, 130.684);
    h2.cp.a = 27.280;
    h2.cp.b = 3.2635e-3;
    h2.cp.c = 0.50208e5;
    assert_int_equal(px_db_add(db, &h2), PX_OK);
    return db;
}

/* -dG/dT = S, dG/dP = V, -T d2G/dT2 = Cp, H = G + TS - (dGf + Tr S) + dHf */
static void check_fd(px_thermo_ws *ws, px_db *db, const px_species *sp, double T, double P)
{
    px_thermo_props p;
    int st = px_thermo_species_props(ws, db, sp, T, P, &p);
    if (st)
        print_error("%s: %s\n", sp->f.text, px_thermo_ws_error(ws));
    assert_int_equal(st, PX_OK);
    const double hT = 0.01, hP = 0.5;
    double Gp, Gm, G0, GPp, GPm;
    assert_int_equal(px_thermo_species_G(ws, db, sp, T + hT, P, &Gp), PX_OK);
    assert_int_equal(px_thermo_species_G(ws, db, sp, T - hT, P, &Gm), PX_OK);
    assert_int_equal(px_thermo_species_G(ws, db, sp, T, P, &G0), PX_OK);
    assert_int_equal(px_thermo_species_G(ws, db, sp, T, P + hP, &GPp), PX_OK);
    assert_int_equal(px_thermo_species_G(ws, db, sp, T, P - hP, &GPm), PX_OK);
    assert_close(G0, p.G, 1e-12, 1e-9);
    assert_close(-(Gp - Gm) / (2 * hT), p.S, 0, 2e-3);
    assert_close((GPp - GPm) / (2 * hP), p.V, 0, 2e-5);
    assert_close(-T * (Gp - 2 * G0 + Gm) / (hT * hT), p.Cp, 0, 0.3);
    /* H from the Gibbs-Helmholtz relation: H = G - T dG/dT ... up to the constant */
    double Hfd = G0 + T * p.S;
    if (isfinite(sp->dHf))
        assert_close(p.H - (sp->dHf - (sp->dGf + PX_TR * sp->S)), Hfd, 1e-12, 1e-6);
}

static void test_finite_differences(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    static const char *sp[] = {"OH^-", "Na^+", "SO4^2-", "CO2(aq)", "Mg^2+", "H2O(l)", "H2(g)"};
    static const double TP[][2] = {{298.15, 1}, {373.15, 200}, {473.15, 50}, {573.15, 100},
                                   {598.15, 250}};
    for (size_t j = 0; j < sizeof TP / sizeof TP[0]; j++)
        for (size_t i = 0; i < sizeof sp / sizeof sp[0]; i++)
            check_fd(ws, db, px_db_find(db, sp[i]), TP[j][0], TP[j][1]);
    /* the g-function is active at 300 C, 100 bar (S92) and slightly negative */
    const px_water_state *w;
    assert_int_equal(px_thermo_ws_water(ws, 573.15, 100, &w), PX_OK);
    px_hkf_gfun g;
    px_hkf_gfunction(w, 0, &g);
    assert_true(g.g < 0 && g.g > -0.01);
    /* hkf/README.md (an independent evaluation with IAPWS density): g = -0.0036 A
     * at 300 C, 85.88 bar and -0.00014 A at 200 C, 15.55 bar.  At 300 C this
     * code gives -0.003546, which rounds to -0.0035: a 1.5 % disagreement
     * between two recollections of S92, documented in docs/thermo.md; its
     * effect on pKw at 300 C is about 0.002 (1.5 % of the 0.13 that g makes
     * there, hkf/README.md).  Checked to 3 %. */
    assert_int_equal(px_thermo_ws_water(ws, 573.15, 85.88, &w), PX_OK);
    px_hkf_gfunction(w, 0, &g);
    assert_close(g.g, -0.0036, 0.03, 0);
    assert_int_equal(px_thermo_ws_water(ws, 473.15, 15.55, &w), PX_OK);
    px_hkf_gfunction(w, 0, &g);
    assert_close(g.g, -0.00014, 0, 0.000005);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* pKw along saturation: H2O(l) = H^+ + OH^- from HKF OH^- (SH88) and the
 * IAPWS-95 water model vs IAPWS R11-07 (water.csv), 0-300 C, within 0.03. */
static void test_pkw(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_reaction r;
    char msg[128];
    assert_int_equal(px_reaction_parse_balanced("H2O(l) = H^+ + OH^-", &r, msg, sizeof msg), PX_OK);
    FILE *fp = px_ref_open("water.csv");
    px_csv_row hdr, row;
    assert_true(px_csv_next(fp, &hdr));
    int cg = px_csv_col(&hdr, "group"), ct = px_csv_col(&hdr, "T_K"), cq = px_csv_col(&hdr, "quantity"),
        cv = px_csv_col(&hdr, "value");
    int n = 0;
    while (px_csv_next(fp, &row)) {
        if (row.n < hdr.n || strcmp(row.f[cg], "saturation_liquid_computed") ||
            strcmp(row.f[cq], "pKw"))
            continue;
        double T = atof(row.f[ct]);
        if (T > 573.16)
            continue; /* phlox's range: 0-300 C */
        double P, logK;
        assert_int_equal(px_thermo_default_pressure(T, &P), PX_OK);
        int st = px_reaction_logK(ws, db, &r, T, P, &logK);
        if (st)
            print_error("%s\n", px_thermo_ws_error(ws));
        assert_int_equal(st, PX_OK);
        print_message("pKw %6.2f C, %7.3f bar: HKF %.4f  IAPWS R11-07 %.4f  diff %+.4f\n",
                      T - 273.15, P, -logK, atof(row.f[cv]), -logK - atof(row.f[cv]));
        assert_close(-logK, atof(row.f[cv]), 0, 0.03);
        n++;
    }
    fclose(fp);
    assert_true(n >= 7);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* ------------------------------------------------------------ potentials */
/* gibbs_25C.csv notation ("SO4-2", "Fe+3", state column) -> phlox notation */
static void to_phlox(const char *sp, const char *state, char *out, size_t n)
{
    char body[64];
    snprintf(body, sizeof body, "%s", sp);
    for (char *c = body; *c; c++)
        if (*c == '.')
            *c = '*'; /* hydrate dot */
    size_t len = strlen(body);
    int charge = 0;
    /* trailing +, -, +2, -3 */
    char *sgn = NULL;
    for (size_t i = 1; i < len; i++)
        if ((body[i] == '+' || body[i] == '-') && (i + 1 == len || (body[i + 1] >= '0' && body[i + 1] <= '9' && i + 2 == len)))
            sgn = &body[i];
    if (sgn) {
        int mag = sgn[1] ? sgn[1] - '0' : 1;
        charge = *sgn == '+' ? mag : -mag;
        *sgn = '\0';
    }
    if (charge) {
        int m = charge > 0 ? charge : -charge;
        if (m == 1)
            snprintf(out, n, "%s^%c", body, charge > 0 ? '+' : '-');
        else
            snprintf(out, n, "%s^%d%c", body, m, charge > 0 ? '+' : '-');
    } else {
        snprintf(out, n, "%s(%s)", body, !strcmp(state, "cr") ? "s" : state);
    }
}

static px_db *db_from_gibbs(void)
{
    px_db *db = px_db_new();
    assert_int_equal(px_db_add_builtins(db), PX_OK); /* H2O(l) = the NBS row */
    FILE *fp = px_ref_open("gibbs_25C.csv");
    px_csv_row hdr, r;
    assert_true(px_csv_next(fp, &hdr));
    int cs = px_csv_col(&hdr, "species"), cst = px_csv_col(&hdr, "state"), cg = px_csv_col(&hdr, "dGf_kJ_mol"),
        ch = px_csv_col(&hdr, "dHf_kJ_mol"), cS = px_csv_col(&hdr, "S_J_molK"), csrc = px_csv_col(&hdr, "source");
    while (px_csv_next(fp, &r)) {
        if (r.n < hdr.n || !strstr(r.f[csrc], "Wagman"))
            continue; /* one table consistently: the NBS 1982 rows */
        char text[64];
        to_phlox(r.f[cs], r.f[cst], text, sizeof text);
        px_species s = mk(text, PX_MODEL_CP, atof(r.f[cg]) * 1000,
                          *r.f[ch] ? atof(r.f[ch]) * 1000 : NAN, *r.f[cS] ? atof(r.f[cS]) : 0);
        if (px_db_find(db, text))
            continue; /* first row wins (H2O(l) built in) */
        int st = px_db_add(db, &s);
        if (st)
            print_error("fixture: cannot add '%s'\n", text);
        assert_int_equal(st, PX_OK);
    }
    fclose(fp);
    /* elements in their reference states: dfG = 0 by definition */
    static const char *el[] = {"Ag(s)", "Cd(s)", "Mn(s)", "Co(s)", "Cr(s)", "Ni(s)"};
    for (size_t i = 0; i < sizeof el / sizeof el[0]; i++)
        if (!px_db_find(db, el[i])) {
            px_species s = mk(el[i], PX_MODEL_CP, 0, 0, 0);
            assert_int_equal(px_db_add(db, &s), PX_OK);
        }
    return db;
}

/* E at 25 C of couples whose standard_potentials.csv row is consistent with
 * the NBS 1982 values (the row's note says so, or the row is derived from
 * them), within 5 mV.  Left out and why (notes of that file): Fe^2+/Fe
 * (-0.447 vs NBS -0.409), Mg^2+/Mg (15 mV), MnO4^-/Mn^2+ (5 mV),
 * Cr couples (no NBS Cr^3+ row), H2O2 couples (CRC pair inconsistent). */
static void test_standard_potentials(void **state)
{
    (void)state;
    static const char *couples[] = {
        "2 H^+ + 2 e- = H2(g)",
        "O2(g) + 4 H^+ + 4 e- = 2 H2O(l)",
        "O2(g) + 2 H2O(l) + 4 e- = 4 OH^-",
        "SO4^2- + 8 H^+ + 6 e- = S(s) + 4 H2O(l)",
        "Fe3O4(s) + 8 H^+ + 8 e- = 3 Fe(s) + 4 H2O(l)",
        "Fe2O3(s) + 6 H^+ + 6 e- = 2 Fe(s) + 3 H2O(l)",
        "Cu^2+ + 2 e- = Cu(s)",
        "Cu2O(s) + 2 H^+ + 2 e- = 2 Cu(s) + H2O(l)",
        "2 CuO(s) + 2 H^+ + 2 e- = Cu2O(s) + H2O(l)",
        "Zn^2+ + 2 e- = Zn(s)",
        "Ni(OH)2(s) + 2 H^+ + 2 e- = Ni(s) + 2 H2O(l)",
        "Cr2O3(s) + 6 H^+ + 6 e- = 2 Cr(s) + 3 H2O(l)",
        "Mn^2+ + 2 e- = Mn(s)",
        "MnO4^- + 2 H2O(l) + 3 e- = MnO2(s) + 4 OH^-",
        "Co^2+ + 2 e- = Co(s)",
        "PbO2(s) + 4 H^+ + 2 e- = Pb^2+ + 2 H2O(l)",
        "PbO2(s) + SO4^2- + 4 H^+ + 2 e- = PbSO4(s) + 2 H2O(l)",
        "Ag^+ + e- = Ag(s)",
        "AgCl(s) + e- = Ag(s) + Cl^-",
        "Cd^2+ + 2 e- = Cd(s)",
    };
    px_db *db = db_from_gibbs();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    FILE *fp = px_ref_open("standard_potentials.csv");
    px_csv_row hdr, r;
    assert_true(px_csv_next(fp, &hdr));
    int cc = px_csv_col(&hdr, "couple"), ce = px_csv_col(&hdr, "E0_V_SHE_25C");
    int found = 0;
    while (px_csv_next(fp, &r)) {
        int want = 0;
        for (size_t i = 0; i < sizeof couples / sizeof couples[0]; i++)
            if (!strcmp(couples[i], r.f[cc]))
                want = 1;
        if (!want)
            continue;
        px_reaction rx;
        char msg[256];
        assert_int_equal(px_reaction_parse_balanced(r.f[cc], &rx, msg, sizeof msg), PX_OK);
        px_reaction_result p;
        int st = px_reaction_props(ws, db, &rx, 298.15, 1.0, &p);
        if (st)
            print_error("%s: %s\n", r.f[cc], px_thermo_ws_error(ws));
        assert_int_equal(st, PX_OK);
        print_message("E %-50s %.4f V vs %s V\n", r.f[cc], p.E, r.f[ce]);
        assert_close(p.E, atof(r.f[ce]), 0, 0.005);
        found++;
    }
    fclose(fp);
    assert_int_equal(found, (int)(sizeof couples / sizeof couples[0]));
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* E(H^+/H2) = 0 at every T (DESIGN.md electron convention); O2/H2O moves. */
static void test_electron_convention(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_species o2 = mk("O2(g)", PX_MODEL_CP, 0, 0, 205.138); /* HO.lua values */
    o2.cp.a = 29.957;
    o2.cp.b = 4.184e-3;
    o2.cp.c = -1.6736e5;
    assert_int_equal(px_db_add(db, &o2), PX_OK);
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_reaction h, o;
    char msg[128];
    assert_int_equal(px_reaction_parse_balanced("2 H^+ + 2 e- = H2(g)", &h, msg, sizeof msg), PX_OK);
    assert_int_equal(px_reaction_parse_balanced("O2(g) + 4 H^+ + 4 e- = 2 H2O(l)", &o, msg, sizeof msg), PX_OK);
    double last = 2;
    for (double T = 298.15; T <= 573.15; T += 25) {
        double P;
        assert_int_equal(px_thermo_default_pressure(T, &P), PX_OK);
        px_reaction_result p;
        assert_int_equal(px_reaction_props(ws, db, &h, T, P, &p), PX_OK);
        assert_close(p.E, 0, 0, 1e-12);
        assert_int_equal(px_reaction_props(ws, db, &o, T, P, &p), PX_OK);
        assert_true(p.E < last); /* E(O2/H2O) falls with T (dS < 0 of the reduction) */
        last = p.E;
        if (T == 298.15) /* NBS 1982: 1.2288 V (standard_potentials.csv note) */
            assert_close(p.E, 1.2288, 0, 0.0003);
    }
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* ------------------------------------------------------------ CP model */
static double cp_poly(const px_species *s, double T)
{
    const px_cp_params *c = &s->cp;
    return c->a + c->b * T + c->c / (T * T) + c->d / sqrt(T) + c->e * T * T;
}

/* composite Simpson, 2000 intervals */
static double simpson(const px_species *s, double a, double b, int over_T)
{
    const int n = 2000;
    double h = (b - a) / n, sum = 0;
    for (int i = 0; i <= n; i++) {
        double T = a + i * h;
        double f = cp_poly(s, T) / (over_T ? T : 1.0);
        sum += f * (i == 0 || i == n ? 1 : (i % 2 ? 4 : 2));
    }
    return sum * h / 3;
}

/* Corundum Al2O3(s): NBS 1982 dfG, dfH, S (gibbs_25C.csv); Cp from memory
 * of Kelley 1960: 27.43 + 3.06e-3 T - 8.47e5/T^2 cal/(mol K); V = 25.575
 * cm3/mol (from memory of Robie and Hemingway 1995).  d and e terms set to
 * test values (no source) to exercise every term of the integral. */
static void test_cp_model(void **state)
{
    (void)state;
    px_species s = mk("Al2O3(s,corundum)", PX_MODEL_CP, -1582.3e3, -1675.7e3, 50.92);
    s.cp.a = 27.43 * CAL;
    s.cp.b = 3.06e-3 * CAL;
    s.cp.c = -8.47e5 * CAL;
    s.cp.V = 2.5575;
    assert_close(cp_poly(&s, 298.15), 79.04, 0, 0.5); /* NBS Cp 79.04 */
    for (int pass = 0; pass < 2; pass++) {
        if (pass == 1) {
            s.cp.d = -150.0; /* test values, no source */
            s.cp.e = 2e-6;
        }
        static const double Ts[] = {273.15, 298.15, 400, 600, 1000};
        for (size_t i = 0; i < sizeof Ts / sizeof Ts[0]; i++) {
            double T = Ts[i], P = 500;
            px_thermo_props p;
            assert_int_equal(px_cp_props(&s, T, P, &p), PX_OK);
            double dH = simpson(&s, 298.15, T, 0), dS = simpson(&s, 298.15, T, 1);
            double G = s.dGf - s.S * (T - 298.15) + dH - T * dS + s.cp.V * (P - 1);
            assert_close(p.G, G, 0, 1e-6);
            assert_close(p.S, s.S + dS, 0, 1e-9);
            assert_close(p.H, s.dHf + dH + s.cp.V * (P - 1), 0, 1e-6);
        }
    }
    /* a gas has no pressure term */
    px_species g = mk("O2(g)", PX_MODEL_CP, 0, 0, 205.138);
    g.cp.a = 29.957;
    px_thermo_props a, b;
    assert_int_equal(px_cp_props(&g, 400, 1, &a), PX_OK);
    assert_int_equal(px_cp_props(&g, 400, 100, &b), PX_OK);
    assert_close(a.G, b.G, 0, 0);
}

/* ------------------------------------------------------------ LOGK model */

/* The isocoulombic estimate (Gu, Gammons and Bloom 1994; docs/thermo.md):
 * the number of water ionisations for reactions worked out by hand, the
 * water ionisation itself reproduced exactly (R = W gives R' = 0), a
 * record's G, S, Cp, V consistent by finite differences, and the
 * temperature basis derived from a record's fields. */
static void test_isocoulombic(void **state)
{
    (void)state;
    static const struct { const char *rx; double n; } cases[] = {
        {"Zn^2+ + H2O(l) = ZnOH^+ + H^+", 0},          /* 2+ | 1+, 1+ */
        {"Ag^+ + Cl^- = AgCl(aq)", 1},                 /* + H2O = H+ + OH- */
        {"Zn^2+ + 3 H2O(l) = Zn(OH)3^- + 3 H^+", -1},  /* Zn2+ + 2 H2O + OH- = Zn(OH)3- + 2 H+ */
        {"Zn^2+ + 4 H2O(l) = Zn(OH)4^2- + 4 H^+", -2},
        {"Zn^2+ + 4 NH3(aq) = Zn(NH3)4^2+", 0},
        {"Fe^3+ + e- = Fe^2+", 0},                     /* e- = 1/2 H2 - H+: 3+ | 2+, 1+ */
        {"H2O(l) = H^+ + OH^-", -1},
    };
    px_reaction r;
    char msg[128];
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; i++) {
        assert_int_equal(px_reaction_parse(cases[i].rx, &r, msg, sizeof msg), PX_OK);
        double n = NAN;
        assert_int_equal(px_reaction_isocoulombic_n(&r, &n), PX_OK);
        if (n != cases[i].n) print_error("%s: n = %g\n", cases[i].rx, n);
        assert_true(n == cases[i].n);
    }

    px_db *db = db_from_hkf();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    /* R = W: the estimate returns phlox's own log Kw at every T */
    assert_int_equal(px_reaction_parse_balanced("H2O(l) = H^+ + OH^-", &r, msg, sizeof msg), PX_OK);
    double kw25, kw, est;
    assert_int_equal(px_reaction_logK(ws, db, &r, PX_TR, PX_PR, &kw25), PX_OK);
    assert_int_equal(px_reaction_logK(ws, db, &r, 573.15, 100, &kw), PX_OK);
    assert_int_equal(px_isocoulombic_logK(ws, db, &r, kw25, 573.15, 100, &est), PX_OK);
    assert_close(est, kw, 0, 1e-9);
    /* a record: NaCl(aq) from Na+ + Cl- with log K 0.5 (invented demo value,
     * for the consistency of G, S, Cp, V only) */
    px_species x = mk("NaCl(aq)", PX_MODEL_LOGK, NAN, NAN, NAN);
    snprintf(x.logk.reaction, sizeof x.logk.reaction, "Na^+ + Cl^- = NaCl(aq)");
    x.logk.logK25 = 0.5; /* invented demo value */
    x.logk.estimate = PX_LOGK_EST_ISOCOULOMBIC;
    assert_int_equal(px_db_add(db, &x), PX_OK);
    const px_species *xs = px_db_find(db, "NaCl(aq)");
    assert_int_equal(xs->tbasis, PX_TBASIS_ESTIMATED);
    assert_string_equal(xs->tmethod, PX_METHOD_ISOCOULOMBIC);
    check_fd(ws, db, xs, 373.15, 50);
    check_fd(ws, db, xs, 573.15, 150);
    /* its formation log K at 300 C: (0.5 + log Kw(25)) Tr/T - log Kw(300) (n = 1) */
    assert_int_equal(px_reaction_parse_balanced("Na^+ + Cl^- = NaCl(aq)", &r, msg, sizeof msg), PX_OK);
    double lk;
    assert_int_equal(px_reaction_logK(ws, db, &r, 573.15, 100, &lk), PX_OK);
    assert_int_equal(px_reaction_parse_balanced("H2O(l) = H^+ + OH^-", &r, msg, sizeof msg), PX_OK);
    double kw25b;
    assert_int_equal(px_reaction_logK(ws, db, &r, PX_TR, PX_PR, &kw25b), PX_OK);
    assert_close(lk, (0.5 + kw25b) * PX_TR / 573.15 - kw, 0, 1e-9);

    /* basis from the fields */
    px_species y = mk("KCl(aq)", PX_MODEL_LOGK, NAN, NAN, NAN);
    const char *m = NULL;
    assert_int_equal(px_species_tbasis(&y, &m), PX_TBASIS_HELD);
    assert_string_equal(m, "");
    y.logk.dH = 1000;
    assert_int_equal(px_species_tbasis(&y, NULL), PX_TBASIS_MEASURED);
    px_species z = mk("ZnO(s)", PX_MODEL_CP, -320.5e3, -350.5e3, 43.65);
    assert_int_equal(px_species_tbasis(&z, NULL), PX_TBASIS_NO_CP);
    z.cp.a = 45.3;
    assert_int_equal(px_species_tbasis(&z, NULL), PX_TBASIS_MEASURED);
    assert_string_equal(px_tbasis_name(PX_TBASIS_HELD), "held");
    px_thermo_ws_free(ws);
    px_db_free(db);
}


/* Kopp-Neumann additivity (Kopp 1865, atomic heats from memory of Perry's
 * handbook table, docs/thermo.md), worked by hand: Ni(OH)2 from atoms =
 * 6.2 + 2 x 4.0 + 2 x 2.3 = 18.8 cal/(mol K); gypsum from anhydrite (a Cp
 * polynomial) + 2 H2O = anhydrite + 2 x (2 x 2.3 + 4.0) cal; components
 * holding more of an element than the species are refused. */
static void test_kopp(void **state)
{
    (void)state;
    px_formula f, comp[2];
    assert_int_equal(px_formula_parse("Ni(OH)2(s)", &f), PX_OK);
    px_cp_params out;
    memset(&out, 0, sizeof out);
    assert_int_equal(px_cp_kopp(&f, 0, NULL, NULL, NULL, &out, NULL, 0), PX_OK);
    assert_close(out.a, 18.8 * CAL, 1e-12, 0);
    assert_true(out.b == 0 && out.c == 0 && out.d == 0 && out.e == 0);
    assert_close(px_kopp_atomic_cp(6), 1.8 * CAL, 1e-12, 0);
    assert_close(px_kopp_atomic_cp(16), 5.4 * CAL, 1e-12, 0);
    assert_close(px_kopp_atomic_cp(26), 6.2 * CAL, 1e-12, 0);
    assert_true(isnan(px_kopp_atomic_cp(0)));

    assert_int_equal(px_formula_parse("CaSO4*2H2O(s,gypsum)", &f), PX_OK);
    assert_int_equal(px_formula_parse("CaSO4(s,anhydrite)", &comp[0]), PX_OK);
    px_cp_params anh = {.a = 70.21, .b = 98.74e-3, .c = 0, .d = 0, .e = 0}; /* coefficients only */
    double one = 1;
    assert_int_equal(px_cp_kopp(&f, 1, comp, &one, &anh, &out, NULL, 0), PX_OK);
    assert_close(out.a, 70.21 + 2 * (2 * 2.3 + 4.0) * CAL, 1e-12, 0);
    assert_close(out.b, 98.74e-3, 1e-12, 0);

    char msg[128];
    assert_int_equal(px_formula_parse("Fe3O4(s)", &f), PX_OK);
    assert_int_equal(px_formula_parse("Fe2O3(s)", &comp[0]), PX_OK);
    double onehalf = 1.5;
    assert_int_equal(px_cp_kopp(&f, 1, comp, &onehalf, &anh, &out, msg, sizeof msg), PX_EDATA);
    assert_non_null(strstr(msg, "0.5 more O"));
    assert_int_equal(px_formula_parse("Zn^2+", &f), PX_OK);
    assert_int_equal(px_cp_kopp(&f, 0, NULL, NULL, NULL, &out, msg, sizeof msg), PX_EDATA);
    /* basis */
    px_species k = mk("Ni(OH)2(s)", PX_MODEL_CP, -447.2e3, -529.7e3, 88);
    k.cp.a = 18.8 * CAL;
    k.cp.estimate = PX_CP_EST_KOPP;
    const char *m = NULL;
    assert_int_equal(px_species_tbasis(&k, &m), PX_TBASIS_ESTIMATED);
    assert_string_equal(m, PX_METHOD_KOPP);
}

static void test_logk_model(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_species o2 = mk("O2(g)", PX_MODEL_CP, 0, 0, 205.138);
    assert_int_equal(px_db_add(db, &o2), PX_OK);
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    /* H2O2(aq) as in HO.lua: G(25 C) gives back NBS dfG = -134.03 kJ/mol */
    px_species h = mk("H2O2(aq)", PX_MODEL_LOGK, NAN, NAN, NAN);
    snprintf(h.logk.reaction, sizeof h.logk.reaction, "O2(g) + H2(g) = H2O2(aq)");
    h.logk.logK25 = 23.481;
    h.logk.dH = -191.17e3;
    assert_int_equal(px_db_add(db, &h), PX_OK);
    double G;
    assert_int_equal(px_thermo_species_G(ws, db, px_db_find(db, "H2O2(aq)"), 298.15, 1, &G), PX_OK);
    assert_close(G / 1000, -134.03, 0, 0.01);
    /* its formation log K follows van 't Hoff at 80 C */
    px_reaction r;
    char msg[128];
    assert_int_equal(px_reaction_parse_balanced("O2(g) + H2(g) = H2O2(aq)", &r, msg, sizeof msg), PX_OK);
    double lk;
    assert_int_equal(px_reaction_logK(ws, db, &r, 353.15, 1, &lk), PX_OK);
    assert_close(lk, 23.481 + 191.17e3 / (PX_R * PX_LN10) * (1 / 353.15 - 1 / 298.15), 0, 1e-9);
    px_thermo_props p;
    assert_int_equal(px_thermo_species_props(ws, db, px_db_find(db, "H2O2(aq)"), 298.15, 1, &p), PX_OK);
    assert_close(p.H / 1000, -191.17, 0, 0.01);
    assert_close(p.S, 143.9, 0, 0.5); /* NBS S (from memory), not an input */

    /* with a constant dCp: Kirchhoff from 25 C (docs/thermo.md, LOGK), by hand:
     * dG(T) = dH + dCp (T - Tr) - T [dS + dCp ln(T/Tr)], dS = (dH - dG(Tr))/Tr;
     * 25 C unchanged; dCp is the species' reaction Cp; the basis stays measured
     * unless the dCp is marked as a Criss-Cobble estimate */
    h.logk.dCp = -150;
    assert_int_equal(px_db_replace(db, &h), PX_OK);
    assert_int_equal(px_reaction_logK(ws, db, &r, 298.15, 1, &lk), PX_OK);
    assert_close(lk, 23.481, 0, 1e-9);
    {
        double T = 473.15, g0 = -PX_R * PX_TR * PX_LN10 * 23.481, s0 = (-191.17e3 - g0) / PX_TR;
        double g = -191.17e3 - 150 * (T - PX_TR) - T * (s0 - 150 * log(T / PX_TR));
        assert_int_equal(px_reaction_logK(ws, db, &r, T, 1, &lk), PX_OK);
        assert_close(lk, -g / (PX_R * PX_LN10 * T), 0, 1e-9);
    }
    check_fd(ws, db, px_db_find(db, "H2O2(aq)"), 400, 5);
    assert_int_equal(px_species_tbasis(px_db_find(db, "H2O2(aq)"), NULL), PX_TBASIS_MEASURED);
    h.logk.cp_estimate = PX_LOGK_CP_EST_CRISS_COBBLE;
    const char *cm = NULL;
    assert_int_equal(px_species_tbasis(&h, &cm), PX_TBASIS_ESTIMATED);
    assert_string_equal(cm, PX_METHOD_CRISS_COBBLE);
    h.logk.dCp = 0;
    h.logk.cp_estimate = PX_LOGK_CP_EST_NONE;
    assert_int_equal(px_db_replace(db, &h), PX_OK);

    /* analytic form: Plummer and Busenberg 1982 log K1 of CO2(aq) (log_k_25C.csv):
     * HCO3^- defined by it gives log K(25 C) = -6.352 through the HKF CO2(aq) */
    px_species hc = mk("HCO3^-", PX_MODEL_LOGK, NAN, NAN, NAN);
    snprintf(hc.logk.reaction, sizeof hc.logk.reaction, "CO2(aq) + H2O(l) = HCO3^- + H^+");
    hc.logk.analytic = 1;
    hc.logk.k[0] = -356.3094;
    hc.logk.k[1] = -0.06091964;
    hc.logk.k[2] = 21834.37;
    hc.logk.k[3] = 126.8339;
    hc.logk.k[4] = -1684915;
    assert_int_equal(px_db_replace(db, &hc), PX_OK);
    assert_int_equal(px_reaction_parse_balanced("CO2(aq) + H2O(l) = HCO3^- + H^+", &r, msg, sizeof msg), PX_OK);
    assert_int_equal(px_reaction_logK(ws, db, &r, 298.15, 1, &lk), PX_OK);
    assert_close(lk, -6.352, 0, 0.001);
    /* finite-difference consistency of a LOGK species (analytic dH, dCp) */
    check_fd(ws, db, px_db_find(db, "HCO3^-"), 350, 5);
    check_fd(ws, db, px_db_find(db, "H2O2(aq)"), 350, 5);

    /* cycle and missing species */
    px_species a = mk("ZnCl^+", PX_MODEL_LOGK, NAN, NAN, NAN);
    snprintf(a.logk.reaction, sizeof a.logk.reaction, "Zn^2+ + Cl^- = ZnCl^+");
    assert_int_equal(px_db_add(db, &a), PX_OK);
    int st = px_thermo_species_G(ws, db, px_db_find(db, "ZnCl^+"), 298.15, 1, &G);
    assert_int_equal(st, PX_ENOTFOUND);
    assert_non_null(strstr(px_thermo_ws_error(ws), "Zn^2+"));
    px_species z = mk("Zn^2+", PX_MODEL_LOGK, NAN, NAN, NAN);
    snprintf(z.logk.reaction, sizeof z.logk.reaction, "ZnCl^+ = Zn^2+ + Cl^-");
    assert_int_equal(px_db_add(db, &z), PX_OK);
    st = px_thermo_species_G(ws, db, px_db_find(db, "ZnCl^+"), 298.15, 1, &G);
    assert_int_equal(st, PX_EDATA);
    assert_non_null(strstr(px_thermo_ws_error(ws), "cycle"));
    double all[400];
    assert_true(px_db_count(db) < 400);
    assert_int_equal(px_thermo_eval_all(ws, db, 298.15, 1, all), PX_EDATA);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* eval_all agrees with one-by-one evaluation, and the cache follows (T, P) */
static void test_eval_all(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    size_t n = px_db_count(db);
    double G1[64], G2[64];
    assert_true(n < 64);
    assert_int_equal(px_thermo_eval_all(ws, db, 423.15, 10, G1), PX_OK);
    assert_int_equal(px_thermo_eval_all(ws, db, 298.15, 1, G2), PX_OK);
    px_thermo_ws *ws2 = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    for (size_t i = 0; i < n; i++) {
        double g;
        assert_int_equal(px_thermo_species_G(ws2, NULL, px_db_get(db, i), 423.15, 10, &g) == PX_OK ||
                         px_db_get(db, i)->f.state == PX_STATE_E, 1);
        if (px_db_get(db, i)->f.state != PX_STATE_E)
            assert_close(G1[i], g, 0, 0);
        if (px_db_get(db, i)->model == PX_MODEL_HKF)
            assert_close(G2[i], px_db_get(db, i)->dGf, 1e-12, 0);
    }
    /* outside the water range: clear error */
    assert_int_equal(px_thermo_eval_all(ws, db, 700, 1, G1), PX_ERANGE);
    assert_non_null(strstr(px_thermo_ws_error(ws), "water"));
    px_thermo_ws_free(ws2);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* H2O(l) = H2O(g): the WATER model (IAPWS-95 anchored at NBS 1982) with the
 * H2O(g) record of HO.lua (NBS 1982 G, H, S; Kelley 1960 Cp) gives
 * K = f(sat) = phi psat: log K vs log10 psat (water.csv, IAPWS-95) within
 * 0.01, which covers the fugacity coefficient of saturated steam (phi ~
 * 0.986 at 100 C, log -0.006: common practice, no source) and the NBS data. */
static void test_vaporization(void **state)
{
    (void)state;
    px_db *db = px_db_new();
    assert_int_equal(px_db_add_builtins(db), PX_OK);
    px_species g = mk("H2O(g)", PX_MODEL_CP, -228572, -241818, 188.825);
    g.cp.a = 30.543;
    g.cp.b = 10.293e-3;
    assert_int_equal(px_db_add(db, &g), PX_OK);
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    px_reaction r;
    char msg[128];
    assert_int_equal(px_reaction_parse_balanced("H2O(l) = H2O(g)", &r, msg, sizeof msg), PX_OK);
    FILE *fp = px_ref_open("water.csv");
    px_csv_row hdr, row;
    assert_true(px_csv_next(fp, &hdr));
    int cg = px_csv_col(&hdr, "group"), ct = px_csv_col(&hdr, "T_K"), cq = px_csv_col(&hdr, "quantity"),
        cv = px_csv_col(&hdr, "value");
    int n = 0;
    while (px_csv_next(fp, &row)) {
        double T = atof(row.f[ct]);
        if (row.n < hdr.n || strcmp(row.f[cg], "saturation_liquid_computed") ||
            strcmp(row.f[cq], "p_sat") || T < 298 || T > 373.2)
            continue;
        double P, lk;
        assert_int_equal(px_thermo_default_pressure(T, &P), PX_OK);
        assert_int_equal(px_reaction_logK(ws, db, &r, T, P, &lk), PX_OK);
        double ref = log10(atof(row.f[cv]) * PX_BAR_PER_MPA);
        print_message("vaporization %.2f C: log K %.4f, log10 psat %.4f\n", T - 273.15, lk, ref);
        assert_close(lk, ref, 0, 0.01);
        n++;
    }
    fclose(fp);
    assert_true(n >= 3);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* bad inputs give a status, never NaN (SQLite-style walk over NaN, Inf) */
static void test_bad_inputs(void **state)
{
    (void)state;
    px_db *db = db_from_hkf();
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    const px_species *oh = px_db_find(db, "OH^-");
    double G = 12345;
    const double bad[] = {NAN, INFINITY, -INFINITY, -1, 0};
    for (size_t i = 0; i < sizeof bad / sizeof bad[0]; i++) {
        assert_true(px_thermo_species_G(ws, db, oh, bad[i], 1, &G) < 0);
        if (isfinite(bad[i]))
            continue;
        assert_true(px_thermo_species_G(ws, db, oh, 298.15, bad[i], &G) < 0);
    }
    assert_close(G, 12345, 0, 0); /* untouched on failure */
    assert_int_equal(px_thermo_species_G(ws, db, oh, 298.15, 2000, &G), PX_ERANGE);
    double P;
    assert_true(px_thermo_default_pressure(NAN, &P) < 0);
    assert_true(px_thermo_default_pressure(700, &P) < 0);
    /* a species with no dGf */
    px_species s = mk("Q^-", PX_MODEL_HKF, NAN, NAN, 0);
    snprintf(s.f.text, sizeof s.f.text, "Cl^-");
    s.f.charge = -1;
    assert_true(px_thermo_species_G(ws, db, &s, 298.15, 1, &G) < 0);
    /* a dielectric model the water module does not provide: a clear error */
    px_thermo_ws *wj = px_thermo_ws_new(PX_DIELECTRIC_JN91);
    int st = px_thermo_species_G(wj, db, oh, 298.15, 1, &G);
    if (st == PX_OK)
        print_message("note: JN91 dielectric now available\n");
    else
        assert_non_null(strstr(px_thermo_ws_error(wj), "water"));
    px_thermo_ws_free(wj);
    px_thermo_ws_free(ws);
    px_db_free(db);
}

/* a workspace reused with a new database (possibly at the same address)
 * uses the new records, never a cached reaction of the old ones */
static void test_ws_reuse(void **state)
{
    (void)state;
    px_thermo_ws *ws = px_thermo_ws_new(PX_DIELECTRIC_R8_97);
    double G[2][8];
    for (int round = 0; round < 2; round++) {
        px_db *db = px_db_new();
        px_species a = mk("Na^+", PX_MODEL_CP, -261905, NAN, 59.0);
        px_species b = mk("Cl^-", PX_MODEL_CP, -131228, NAN, 56.5);
        px_species c = mk("NaCl(aq)", PX_MODEL_LOGK, NAN, NAN, NAN);
        snprintf(c.logk.reaction, sizeof c.logk.reaction, "Na^+ + Cl^- = NaCl(aq)");
        c.logk.logK25 = round == 0 ? -0.5 : 0.5; /* test values, no source */
        assert_int_equal(px_db_add(db, &a), PX_OK);
        assert_int_equal(px_db_add(db, &b), PX_OK);
        assert_int_equal(px_db_add(db, &c), PX_OK);
        assert_int_equal(px_thermo_eval_all(ws, db, 298.15, 1, G[round]), PX_OK);
        px_db_free(db);
    }
    assert_close(G[0][2] - G[1][2], PX_R * 298.15 * PX_LN10, 1e-12, 0);
    px_thermo_ws_free(ws);
}

/* default pressure: 1 bar to 100 C, saturation above (water.csv p_sat) */
static void test_default_pressure(void **state)
{
    (void)state;
    double P;
    assert_int_equal(px_thermo_default_pressure(298.15, &P), PX_OK);
    assert_close(P, 1.0, 0, 0);
    assert_int_equal(px_thermo_default_pressure(372.0, &P), PX_OK);
    assert_close(P, 1.0, 0, 0);
    /* 100 C: psat = 1.014 bar (1 bar would be steam) */
    assert_int_equal(px_thermo_default_pressure(373.15, &P), PX_OK);
    assert_close(P, 1.01418, 0, 1e-4);
    FILE *fp = px_ref_open("water.csv");
    px_csv_row hdr, row;
    assert_true(px_csv_next(fp, &hdr));
    int cg = px_csv_col(&hdr, "group"), ct = px_csv_col(&hdr, "T_K"), cq = px_csv_col(&hdr, "quantity"),
        cv = px_csv_col(&hdr, "value");
    int n = 0;
    while (px_csv_next(fp, &row)) {
        if (row.n < hdr.n || strcmp(row.f[cg], "saturation_liquid_computed") ||
            strcmp(row.f[cq], "p_sat") || atof(row.f[ct]) < 373.15)
            continue;
        assert_int_equal(px_thermo_default_pressure(atof(row.f[ct]), &P), PX_OK);
        assert_close(P, atof(row.f[cv]) * PX_BAR_PER_MPA, 1e-6, 0);
        n++;
    }
    fclose(fp);
    assert_true(n >= 4);
}

/* px_reaction_format with huge coefficients: "%.0f" of 1e30 is 31 digits
 * and overflowed a 32-byte stack buffer; now the text is complete when the
 * buffer is large enough and truncated (PX_ERANGE) when it is not.  The parser
 * refuses such coefficients (a slip, not chemistry). */
static void test_reaction_format_huge(void **state)
{
    (void)state;
    px_reaction r;
    char msg[256], big[1024], small[16];
    assert_int_equal(px_reaction_parse("2 H2O(l) = O2(g) + 4 H^+ + 4 e-", &r, msg, sizeof msg), PX_OK);
    static const double coefs[] = {1e30, -1e30, 1e300, 12345678901234567890.0, 1.5e-300};
    for (size_t k = 0; k < sizeof coefs / sizeof coefs[0]; k++) {
        px_reaction q = r;
        q.nu[0] = -fabs(coefs[k]);
        assert_int_equal(px_reaction_format(&q, big, sizeof big), PX_OK);
        char want[400];
        snprintf(want, sizeof want, "%.0f H2O(l) =", fabs(coefs[k]));
        if (fabs(coefs[k]) >= 1) assert_non_null(strstr(big, want));
        assert_int_equal(px_reaction_format(&q, small, sizeof small), PX_ERANGE);
        assert_true(strlen(small) < sizeof small);
    }
    /* coefficients outside [1e-4, 1e4], also once netted; a side that nets
     * to nothing (the last three found by fuzz_reaction) */
    static const struct {
        const char *text, *needle;
        int status;
    } bad[] = {
        {"1000000000000000000000000000000 H2O(l) = O2(g)", "larger than", PX_ERANGE},
        {"20000.5 H2O(l) = O2(g)", "larger than", PX_ERANGE},
        {"0.5 H3(g) = H3(g)+ 0.5 e-", "no species left on one side", PX_EPARSE},
        {"1/8888220 O^+ = HO(l)", "smaller than", PX_ERANGE},
        {"H2O(l) = 9999 H2(g) + 9999 H2(g) + O2(g)", "add up to", PX_ERANGE},
    };
    for (size_t k = 0; k < sizeof bad / sizeof bad[0]; k++) {
        assert_int_equal(px_reaction_parse(bad[k].text, &r, msg, sizeof msg), bad[k].status);
        assert_non_null(strstr(msg, bad[k].needle));
    }
    /* the balance message never writes past a small buffer */
    assert_int_equal(px_reaction_parse("Fe(s) = Fe^2+ + Cl^- + Na^+ + e-", &r, msg, sizeof msg), PX_OK);
    char tiny[8];
    assert_int_not_equal(px_reaction_balance(&r, tiny, sizeof tiny), PX_OK);
    assert_true(strlen(tiny) < sizeof tiny);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_reaction_format_huge),
        cmocka_unit_test(test_reaction_parse),  cmocka_unit_test(test_reaction_errors),
        cmocka_unit_test(test_db),
        cmocka_unit_test(test_db_resolve),
        cmocka_unit_test(test_hkf_table_cp_v),
        cmocka_unit_test(test_hkf_estimate),    cmocka_unit_test(test_finite_differences),
        cmocka_unit_test(test_pkw),             cmocka_unit_test(test_standard_potentials),
        cmocka_unit_test(test_electron_convention), cmocka_unit_test(test_cp_model),
        cmocka_unit_test(test_isocoulombic),  cmocka_unit_test(test_kopp),  cmocka_unit_test(test_logk_model),      cmocka_unit_test(test_eval_all),
        cmocka_unit_test(test_default_pressure), cmocka_unit_test(test_bad_inputs),
        cmocka_unit_test(test_ws_reuse),        cmocka_unit_test(test_vaporization),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
