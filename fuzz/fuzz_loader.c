/* fuzz_loader.c - libFuzzer harness for the element-file loader
 * (src/data: tokenizer for line numbers, sandbox, table reader, checks):
 * any bytes as a file must load or be reported, within small limits, with
 * no crash, leak or overrun.  Lua's own parser runs first (text only). */
#include "core/status.h"
#include "data/data.h"
#include <stdint.h>
#include <stdlib.h>

#define FUZZ_MEM (2u << 20)      /* bytes per input: keeps each run short */
#define FUZZ_INSTR 200000UL      /* instructions (and charged C work) per input */
#define FUZZ_WALL 2.0            /* seconds per input */

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    px_data_options o = px_data_options_default();
    o.mem_limit = FUZZ_MEM;
    o.instr_limit = FUZZ_INSTR;
    o.wall_limit = FUZZ_WALL;
    px_data_problems *p = px_data_problems_new();
    if (!p) return 0;
    (void)px_data_check_buffer(NULL, (const char *)data, size, "fuzz.lua", &o, p);
    char line[512];
    for (size_t i = 0; i < px_data_problems_count(p); i++)
        (void)px_data_problem_format(px_data_problems_get(p, i), line, sizeof line);
    px_data_problems_free(p);
    /* the same bytes as a user override file take the other branch */
    o.user_file = 1;
    (void)px_data_check_buffer(NULL, (const char *)data, size, "fuzz.lua", &o, NULL);
    return 0;
}
