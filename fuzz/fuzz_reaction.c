/* fuzz_reaction.c - libFuzzer harness for the reaction parser, the balance
 * check and the formatter (src/thermo/reaction.c): any text parses or fails
 * with a message; a parsed reaction formats into buffers of every small size
 * without overrunning them (ASan), and the full text parses again. */
#include "core/status.h"
#include "fuzz_common.h"
#include "thermo/thermo.h"
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define FMT_MAX 4096

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    char *s = fuzz_cstring(data, size);
    if (!s) return 0;
    px_reaction r, q;
    char msg[256];
    if (px_reaction_parse(s, &r, msg, sizeof msg) == PX_OK) {
        char small[64];
        (void)px_reaction_balance(&r, small, sizeof small);
        (void)px_reaction_balance(&r, msg, sizeof msg);
        for (size_t n = 1; n <= sizeof small; n++) /* exact-size heap copies let ASan see overruns */
        {
            char *b = malloc(n);
            if (!b) break;
            (void)px_reaction_format(&r, b, n);
            if (!memchr(b, '\0', n)) abort();
            free(b);
        }
        char *full = malloc(FMT_MAX);
        if (full && px_reaction_format(&r, full, FMT_MAX) == PX_OK &&
            px_reaction_parse(full, &q, msg, sizeof msg) != PX_OK) {
            fprintf(stderr, "formatted '%s' does not parse again: %s\n", full, msg);
            abort(); /* the formatted text must parse again */
        }
        free(full);
    }
    free(s);
    return 0;
}
