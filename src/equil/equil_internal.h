/* equil_internal.h - private layout of the speciation system and its
 * workspace, shared by the files of src/equil only (see equil.h). */
#ifndef PX_EQUIL_INTERNAL_H
#define PX_EQUIL_INTERNAL_H
#include "equil.h"

/* Ionic strength never drops below this in the ionic-strength equation so
 * its log stays finite (I = 1e-20 mol/kg shifts log gamma by < 1e-10).
 * Numerical choice, no source. */
#define PX_EQUIL_I_FLOOR 1e-20
/* Largest log10 molality a species may take during the iteration (keeps
 * 10^x finite in double precision).  Numerical choice, no source. */
#define PX_EQUIL_LM_MAX 300.0
/* Bounds of the log10 ionic strength unknown (1e-20 .. 1e3 mol/kg).
 * Numerical choice, no source. */
#define PX_EQUIL_XI_MIN (-20.0)
#define PX_EQUIL_XI_MAX 3.0

struct px_equil_system {
    px_allocator alloc;
    int has_alloc;
    size_t nb, ns;
    double *nu;        /* ns x nb, row-major */
    double *logk;      /* ns */
    double *z;         /* ns */
    double *size;      /* ns */
    int *phase;        /* ns */
    unsigned *flags;   /* ns */
    unsigned char *is_set; /* ns */
    int *ckind;        /* nb: PX_EQUIL_C_* */
    double *cval;      /* nb: total, log a or log f */
    size_t *cgas;      /* nb: gas species for PX_EQUIL_C_FUGACITY */
    px_equil_activity act;
    unsigned long rev;  /* bumped by every structural change */
    size_t n_sit, cap_sit;
    size_t *sit_j, *sit_k;
    double *sit_eps;
};

struct px_equil_work {
    px_allocator alloc;
    int has_alloc;
    size_t nb, ns, nmax;   /* nmax: largest Newton system, 2 nb + 1 */
    /* state carried between solves (warm start) */
    int have;
    double *y;             /* nb: log10 m (aqueous basis) or log10 a */
    double xI;             /* log10 ionic strength */
    double *amt;           /* ns: solid amounts, mol/kg water */
    unsigned char *active; /* ns: solid in the active set */
    double *lag;           /* ns: lagged SIT sum eps m */
    unsigned char *absent_prev; /* nb: absent pattern of the stored state */
    /* the last two solutions and their constraints (sweep predictor) */
    int hist;
    double *y_p1, *y_p2, *par_p1, *par_p2;
    double xI_p1, xI_p2;
    size_t sig_p1, sig_p2;
    /* per solve */
    unsigned char *cabsent; /* nb: component with zero total, species drop out */
    unsigned char *posonly; /* nb: aqueous basis with no negative coefficient */
    const px_equil_system *prep_sys; /* structure prepared for (sys, rev) */
    unsigned long prep_rev;
    unsigned char *sabsent; /* ns */
    unsigned char *blocked; /* ns: solid refused (singular) during this solve */
    size_t *col;           /* nb: Newton column of basis i, or SIZE_MAX */
    size_t *row;           /* nb: Newton row of component i, or SIZE_MAX */
    size_t *solids;        /* active solids in column order */
    size_t n_active;
    size_t ncol;           /* basis columns; then I; then solids */
    size_t *nz_start, *nz_idx; /* sparse nu: ns + 1, ns x nb */
    double *nz_val;
    size_t *jz_start, *jz_col; /* the same restricted to Newton columns */
    double *jz_val;
    size_t *rz_start, *rz_row; /* ... restricted to mass-balance rows */
    double *rz_val;
    /* evaluation */
    double *g, *dg, *la, *lm, *m, *c;  /* ns each */
    double *lag_next;      /* ns */
    double lag_change;
    double *R, *scale, *J, *dx;  /* nmax, nmax, nmax^2, nmax */
    size_t *perm;          /* nmax */
    size_t *row_kind, *row_index; /* nmax: what row r is (for failure reports) */
    size_t nrow;
    int xi_apart;          /* log I's step limited apart from the others (fallback) */
    double phi;            /* merit: sum (R/scale)^2 */
    /* backup for the line search */
    double *y_save, *amt_save;
    double xI_save;
    /* results */
    double *resid_comp;    /* nb */
    double *tot_given, *tot_aq, *tot_solid; /* nb */
    int *ckind;            /* nb: copy of the constraint kinds of the last solve */
    int *phase;            /* ns: copy of the phases of the last solve */
    px_equil_stats st;
};

/* activity models (equil_activity.c): fill g, dg (d log gamma / d log10 I)
 * for aqueous species, 0 elsewhere; lag is added to g. */
void px_equil_gamma(const px_equil_system *sys, const unsigned char *absent,
                    double I, const double *lag, double *g, double *dg);
/* SIT sums eps(j,k) m_k into out (ns) */
void px_equil_sit_sum(const px_equil_system *sys, const double *m, double *out);

#endif
