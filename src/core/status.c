/* status.c - messages for the status table in status.h. */
#include "status.h"
#include <stdarg.h>
#include <stdio.h>

const char *px_strerror(int status)
{
    switch (status) {
#define PX_STATUS_MSG(name, code, msg) case code: return msg;
        PX_STATUS_LIST(PX_STATUS_MSG)
#undef PX_STATUS_MSG
    default: return "unknown status";
    }
}

const char *px_status_name(int status)
{
    switch (status) {
#define PX_STATUS_NAME(name, code, msg) case code: return #name;
        PX_STATUS_LIST(PX_STATUS_NAME)
#undef PX_STATUS_NAME
    default: return "PX_UNKNOWN";
    }
}

int px_fail(char *msg, size_t n, int status, const char *fmt, ...)
{
    if (msg && n) {
        va_list ap;
        va_start(ap, fmt);
        vsnprintf(msg, n, fmt, ap);
        va_end(ap);
    }
    return status;
}
