/* status.c - messages for the status table in status.h. */
#include "status.h"

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
