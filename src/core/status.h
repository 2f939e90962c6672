/* status.h - the one table of status codes shared by every phlox module.
 *
 * Signed codes: 0 is success, positive is success with a remark the caller
 * may want to show, negative is failure.  Codes and their messages come from
 * one X-macro list so they cannot drift apart.  Numerical code returns these
 * and never prints; the Lua layer and the CLI turn them into words with
 * px_strerror() plus the detail the failing object kept. */
#ifndef PX_STATUS_H
#define PX_STATUS_H
#include <stddef.h>

#define PX_STATUS_LIST(X)                                                     \
    X(PX_OK, 0, "success")                                                    \
    X(PX_EXTRAPOLATED, 1, "outside the declared valid range (extrapolated)") \
    X(PX_ENOMEM, -1, "out of memory")                                         \
    X(PX_EINVAL, -2, "invalid argument")                                      \
    X(PX_ERANGE, -3, "outside the valid range")                               \
    X(PX_ENOCONV, -4, "did not converge")                                     \
    X(PX_EPARSE, -5, "cannot parse")                                          \
    X(PX_EBALANCE, -6, "does not balance")                                    \
    X(PX_ENOTFOUND, -7, "not found")                                          \
    X(PX_ESINGULAR, -8, "singular system")                                    \
    X(PX_ENONFINITE, -9, "non-finite value")                                  \
    X(PX_EIO, -10, "input/output error")                                      \
    X(PX_EDATA, -11, "invalid data")                                          \
    X(PX_ELIMIT, -12, "limit exceeded")

enum px_status {
#define PX_STATUS_ENUM(name, code, msg) name = code,
    PX_STATUS_LIST(PX_STATUS_ENUM)
#undef PX_STATUS_ENUM
};

/* Message for a status code; never NULL ("unknown status" for others). */
const char *px_strerror(int status);

/* The enumerator's name ("PX_ENOCONV"), for logs and tests. */
const char *px_status_name(int status);

/* Write a printf-style reason into msg (if msg and n are non-zero) and
 * return status: `return px_fail(msg, n, PX_EINVAL, "bad %s", what);` */
#if defined(__GNUC__)
__attribute__((format(printf, 4, 5)))
#endif
int px_fail(char *msg, size_t n, int status, const char *fmt, ...);

#endif
