/* sha256.h - SHA-256 (FIPS PUB 180-4), for the provenance stamp: every
 * exported table and figure records the SHA-256 of the script and of each
 * definition file that produced it. */
#ifndef PX_SHA256_H
#define PX_SHA256_H
#include <stddef.h>
#include <stdint.h>

typedef struct px_sha256 {
    uint32_t h[8];
    uint64_t len; /* bytes hashed so far */
    unsigned char buf[64];
    size_t nbuf;
} px_sha256;

void px_sha256_init(px_sha256 *s);
void px_sha256_update(px_sha256 *s, const void *data, size_t n);
void px_sha256_final(px_sha256 *s, unsigned char out[32]);
/* One call: hex digest (64 characters + NUL) of data. */
void px_sha256_hex(const void *data, size_t n, char hex[65]);

#endif
