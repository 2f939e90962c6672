/* fuzz_common.h - what the harnesses share: the input as a C string. */
#ifndef PX_FUZZ_COMMON_H
#define PX_FUZZ_COMMON_H
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

/* A NUL-terminated heap copy of the input (exact size, so ASan sees any
 * read past its end), or NULL. */
static inline char *fuzz_cstring(const uint8_t *data, size_t size)
{
    char *s = malloc(size + 1);
    if (s) {
        memcpy(s, data, size);
        s[size] = '\0';
    }
    return s;
}

#endif
