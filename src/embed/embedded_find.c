/* embedded_find.c - lookup in the table of embedded Lua sources. */
#include "embed/embedded.h"
#include <string.h>

const px_embedded_file *px_embedded_find(const char *path)
{
    for (size_t i = 0; i < px_embedded_count; i++)
        if (strcmp(px_embedded_files[i].path, path) == 0)
            return &px_embedded_files[i];
    return NULL;
}
