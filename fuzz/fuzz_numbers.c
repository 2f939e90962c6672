/* fuzz_numbers.c - libFuzzer harness for every number parser: the input (up
 * to 64 bytes, no NUL) is put where a number goes in each grammar: a
 * reaction coefficient, a formula count, a hydrate count, a charge, and a
 * value and a T_range bound of an element file (Lua's lexer, then the
 * loader's range checks). */
#include "core/status.h"
#include "data/data.h"
#include "thermo/thermo.h"
#include <stdint.h>
#include <stdio.h>
#include <string.h>

#define NUM_MAX 64

int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    if (size > NUM_MAX || memchr(data, '\0', size)) return 0;
    char num[NUM_MAX + 1];
    memcpy(num, data, size);
    num[size] = '\0';
    char text[512], msg[256];
    px_reaction r;
    px_formula f;
    snprintf(text, sizeof text, "%s H2O(l) = %s H^+ + %s OH^-", num, num, num);
    (void)px_reaction_parse(text, &r, msg, sizeof msg);
    snprintf(text, sizeof text, "Fe%s(OH)%s(s)", num, num);
    (void)px_formula_parse_msg(text, &f, msg, sizeof msg);
    snprintf(text, sizeof text, "CaSO4:%sH2O(s)", num);
    (void)px_formula_parse_msg(text, &f, msg, sizeof msg);
    snprintf(text, sizeof text, "Fe^%s+", num);
    (void)px_formula_parse_msg(text, &f, msg, sizeof msg);
    px_data_options o = px_data_options_default();
    o.instr_limit = 100000UL;
    o.mem_limit = 1u << 20;
    char file[1024];
    snprintf(file, sizeof file,
             "return { element = 'Zn', species = { { formula = 'ZnO(s)', model = 'cp', G = %s, "
             "H = -350.46, S = 43.65, cp = { a = %s, c = %s }, T_range = { 298.15, %s }, "
             "source = 'fuzz' }, { formula = 'ZnOH^+', model = 'logk', reaction = "
             "'Zn^2+ + H2O(l) = ZnOH^+ + H^+', logK = %s, dH = %s, source = 'fuzz' } } }",
             num, num, num, num, num, num);
    (void)px_data_check_buffer(NULL, file, strlen(file), "n.lua", &o, NULL);
    return 0;
}
