/* fuzz_formula.c - libFuzzer harness for the formula parser
 * (src/thermo/formula.c): any bytes, as a NUL-terminated string, must parse
 * or fail with a message, never crash or overrun; a parsed formula must
 * parse again from its canonical text to the same composition. */
#include "core/status.h"
#include "fuzz_common.h"
#include "thermo/thermo.h"
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    char *s = fuzz_cstring(data, size);
    if (!s) return 0;
    px_formula f, g;
    char msg[256];
    if (px_formula_parse_msg(s, &f, msg, sizeof msg) == PX_OK) {
        (void)px_formula_molar_mass(&f);
        if (px_formula_parse(f.text, &g) != PX_OK || strcmp(f.text, g.text) != 0 || f.n_elem != g.n_elem ||
            f.charge != g.charge)
            abort(); /* the canonical text must round-trip */
    } else if (!memchr(msg, '\0', sizeof msg)) {
        abort();
    }
    free(s);
    return 0;
}
