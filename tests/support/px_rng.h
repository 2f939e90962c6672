/* px_rng.h - the seeded random numbers of the C tests and benchmarks, so a
 * failing random case can be replayed: xorshift64* (Vigna 2016, ACM Trans.
 * Math. Softw. 42(4), art. 30: shifts 12, 25, 27, multiplier
 * 2685821657736338717), the top 53 bits as a double in [0, 1).
 *   px_rng_seed(&r, seed)   start a sequence (any seed; 0 is mapped away
 *                           from the all-zero state by the golden-ratio
 *                           multiplier + 1)
 *   px_rng_uniform(&r)      the next number in [0, 1) */
#ifndef PX_TEST_RNG_H
#define PX_TEST_RNG_H

typedef struct px_rng {
    unsigned long long s;
} px_rng;

static inline void px_rng_seed(px_rng *r, unsigned long long seed)
{
    r->s = seed * 0x9E3779B97F4A7C15ULL + 1;
}

/* Sets the raw state (for sequences that were seeded that way). */
static inline void px_rng_set_state(px_rng *r, unsigned long long state)
{
    r->s = state;
}

static inline double px_rng_uniform(px_rng *r)
{
    r->s ^= r->s >> 12;
    r->s ^= r->s << 25;
    r->s ^= r->s >> 27;
    return (double)((r->s * 2685821657736338717ULL) >> 11) / 9007199254740992.0;
}

#endif
