/* constants.h - physical constants and reference state used everywhere.
 * CODATA 2018 recommended values (Tiesinga et al. 2021, Rev. Mod. Phys. 93,
 * 025010); reference state 298.15 K and 1 bar (DESIGN.md conventions). */
#ifndef PX_CONSTANTS_H
#define PX_CONSTANTS_H

#define PX_R 8.314462618         /* J/(mol K), CODATA 2018 (exact) */
#define PX_F 96485.33212         /* C/mol, CODATA 2018 (exact) */
#define PX_NA 6.02214076e23      /* 1/mol, CODATA 2018 (exact) */
#define PX_KB 1.380649e-23       /* J/K, CODATA 2018 (exact) */
#define PX_QE 1.602176634e-19    /* C, CODATA 2018 (exact) */
#define PX_EPS0 8.8541878128e-12 /* F/m, CODATA 2018 */
#define PX_CAL 4.184             /* J per thermochemical calorie (exact) */
#define PX_TR 298.15             /* K, reference temperature */
#define PX_PR 1.0                /* bar, reference pressure */
#define PX_T0C 273.15            /* K at 0 degrees Celsius */
#define PX_LN10 2.302585092994045684
#define PX_BAR_PER_MPA 10.0

#endif
