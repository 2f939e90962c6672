/* png.c - a PNG writer for figures drawn on a cairo image surface: one pass
 * from the surface's pixels to the file's bytes, with the figure's metadata
 * as text chunks, and a fast deflate of our own (LZ77 with one hash probe
 * plus the pixel-repeat and row-repeat distances, one block of fixed
 * Huffman codes).  cairo's PNG writer compresses harder and costs 20-30 ms
 * per figure; figures are large flat fields, where the repeats found here
 * do nearly all the work.  Formats: PNG (ISO/IEC 15948, W3C PNG 2nd ed.),
 * zlib (RFC 1950), deflate (RFC 1951). */
#include "core/alloc.h"
#include "render/png.h"
#include "core/status.h"
#include <stdint.h>
#include <stdlib.h>
#include <string.h>

#define PX_LZ_HASH_BITS 15   /* hash table of 3-byte sequences: 32 K entries */
#define PX_LZ_WINDOW 32768   /* deflate's largest distance (RFC 1951 3.2.5) */
#define PX_LZ_MIN 3          /* shortest and longest match (RFC 1951 3.2.5) */
#define PX_LZ_MAX 258
#define PX_IDAT_MAX ((size_t)1 << 16) /* image data per IDAT chunk (any split is valid, PNG 11.2.4) */

typedef struct bitw {
    unsigned char *p;
    size_t n;
    uint64_t acc;
    int bits;
} bitw;

static void put_bits(bitw *w, uint32_t v, int k) /* LSB first (RFC 1951 3.1.1) */
{
    w->acc |= (uint64_t)v << w->bits;
    w->bits += k;
    while (w->bits >= 8) {
        w->p[w->n++] = (unsigned char)w->acc;
        w->acc >>= 8;
        w->bits -= 8;
    }
}

static uint32_t reversed(uint32_t code, int len)
{
    uint32_t r = 0;
    for (int i = 0; i < len; i++) r |= ((code >> i) & 1u) << (len - 1 - i);
    return r;
}

/* The tables of one stream: fixed literal/length codes bit-reversed
 * (RFC 1951 3.2.6), and the length and distance code of every length and
 * distance (RFC 1951 3.2.5). */
typedef struct codes {
    uint16_t sym[288];
    uint8_t sym_len[288];
    uint8_t len_code[PX_LZ_MAX + 1];
    uint8_t dist_code[PX_LZ_WINDOW + 1];
} codes;

static void put_sym(bitw *w, const codes *c, int s) { put_bits(w, c->sym[s], c->sym_len[s]); }

/* Length and distance codes: bases and extra bits (RFC 1951 3.2.5). */
static const uint16_t len_base[29] = {3,  4,  5,  6,  7,  8,  9,  10, 11,  13,  15,  17,  19,  23, 27,
                                      31, 35, 43, 51, 59, 67, 83, 99, 115, 131, 163, 195, 227, 258};
static const uint8_t len_extra[29] = {0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2,
                                      2, 3, 3, 3, 3, 4, 4, 4, 4, 5, 5, 5, 5, 0};
static const uint16_t dist_base[30] = {1,    2,    3,    4,    5,    7,     9,     13,    17,  25,
                                       33,   49,   65,   97,   129,  193,   257,   385,   513, 769,
                                       1025, 1537, 2049, 3073, 4097, 6145,  8193,  12289, 16385,
                                       24577};
static const uint8_t dist_extra[30] = {0, 0, 0, 0, 1, 1, 2, 2,  3,  3,  4,  4,  5,  5,  6,
                                       6, 7, 7, 8, 8, 9, 9, 10, 10, 11, 11, 12, 12, 13, 13};

static void codes_init(codes *c)
{
    for (int s = 0; s < 288; s++) { /* Huffman codes go most significant bit first (3.1.1) */
        uint32_t code = s < 144 ? 0x30u + (uint32_t)s : s < 256 ? 0x190u + (uint32_t)(s - 144)
                        : s < 280 ? (uint32_t)(s - 256) : 0xc0u + (uint32_t)(s - 280);
        int len = s < 144 ? 8 : s < 256 ? 9 : s < 280 ? 7 : 8;
        c->sym[s] = (uint16_t)reversed(code, len);
        c->sym_len[s] = (uint8_t)len;
    }
    for (int lc = 0, l = PX_LZ_MIN; l <= PX_LZ_MAX; l++) {
        while (lc < 28 && len_base[lc + 1] <= l) lc++;
        c->len_code[l] = (uint8_t)lc;
    }
    for (int dc = 0, d = 1; d <= PX_LZ_WINDOW; d++) {
        while (dc < 29 && dist_base[dc + 1] <= d) dc++;
        c->dist_code[d] = (uint8_t)dc;
    }
}

static void put_match(bitw *w, const codes *c, size_t len, size_t dist)
{
    int lc = c->len_code[len];
    put_sym(w, c, 257 + lc);
    if (len_extra[lc]) put_bits(w, (uint32_t)(len - len_base[lc]), len_extra[lc]);
    int dc = c->dist_code[dist];
    put_bits(w, reversed((uint32_t)dc, 5), 5);
    if (dist_extra[dc]) put_bits(w, (uint32_t)(dist - dist_base[dc]), dist_extra[dc]);
}

/* Length of the common run of d[i..] and d[j..] (j < i), at most
 * PX_LZ_MAX, compared eight bytes at a time. */
static size_t match_len(const unsigned char *d, size_t i, size_t j, size_t n)
{
    size_t max = n - i < PX_LZ_MAX ? n - i : PX_LZ_MAX, k = 0;
    while (k + 8 <= max) {
        uint64_t a, b;
        memcpy(&a, d + i + k, 8);
        memcpy(&b, d + j + k, 8);
        if (a != b) break;
        k += 8;
    }
    while (k < max && d[i + k] == d[j + k]) k++;
    return k;
}

/* zlib stream of d[0..n) into out (room for px_png_deflate_bound(n)). */
/* Adler-32 (RFC 1950 2.2, 8.2), eight bytes a step. */
static uint32_t adler32(const unsigned char *d, size_t n)
{
    uint32_t a = 1, b = 0;
    for (size_t k = 0; k < n;) {
        size_t stop = n - k < 5552 ? n : k + 5552; /* largest run without overflow (RFC 1950 9) */
        for (; k + 8 <= stop; k += 8) {
            a += d[k], b += a, a += d[k + 1], b += a, a += d[k + 2], b += a, a += d[k + 3], b += a;
            a += d[k + 4], b += a, a += d[k + 5], b += a, a += d[k + 6], b += a, a += d[k + 7], b += a;
        }
        for (; k < stop; k++) a += d[k], b += a;
        a %= 65521u, b %= 65521u;
    }
    return b << 16 | a;
}

static size_t zlib_stream(const unsigned char *d, size_t n, size_t bpp, size_t row,
                          unsigned char *out, int32_t *head, codes *c)
{
    codes_init(c);
    bitw w = {out, 0, 0, 0};
    put_bits(&w, 0x78, 8); /* CM 8, 32 K window; FLEVEL 0 (RFC 1950 2.2) */
    put_bits(&w, 0x01, 8); /* FCHECK: 0x7801 is a multiple of 31 */
    put_bits(&w, 1, 1);    /* BFINAL */
    put_bits(&w, 1, 2);    /* BTYPE 01: fixed Huffman codes */
    for (size_t k = 0; k < ((size_t)1 << PX_LZ_HASH_BITS); k++) head[k] = -1;
    size_t i = 0;
    while (i < n) {
        size_t best = 0, dist = 0;
        if (i + PX_LZ_MIN <= n) {
            uint32_t h = ((uint32_t)d[i] << 16 | (uint32_t)d[i + 1] << 8 | d[i + 2]) * 2654435761u >>
                         (32 - PX_LZ_HASH_BITS);
            int32_t prev = head[h];
            head[h] = (int32_t)i;
            size_t c3 = prev >= 0 && i - (size_t)prev <= PX_LZ_WINDOW ? i - (size_t)prev : 0;
            const size_t cands[3] = {bpp, row, c3}; /* pixel repeat, row repeat, hash */
            for (int c = 0; c < 3 && best < PX_LZ_MAX; c++) {
                size_t dd = cands[c];
                if (dd == 0 || dd > i || dd > PX_LZ_WINDOW || dd == dist) continue;
                if (best && (i + best >= n || d[i + best] != d[i - dd + best])) continue;
                size_t l = match_len(d, i, i - dd, n);
                if (l > best) best = l, dist = dd;
            }
        }
        if (best >= PX_LZ_MIN) {
            put_match(&w, c, best, dist);
            i += best; /* the match's interior is not hashed: the repeats find the next */
        } else {
            put_sym(&w, c, d[i]);
            i++;
        }
    }
    put_sym(&w, c, 256); /* end of block */
    if (w.bits) put_bits(&w, 0, 8 - w.bits);
    uint32_t ad = adler32(d, n);
    for (int s = 24; s >= 0; s -= 8) out[w.n++] = (unsigned char)(ad >> s);
    return w.n;
}

/* CRC-32 of PNG chunks (ISO 3309 polynomial; PNG spec, Annex D), by a
 * table made per call (2 K steps, no shared state between threads). */
static uint32_t crc_update(uint32_t c, const unsigned char *p, size_t n)
{
    uint32_t table[256];
    for (uint32_t k = 0; k < 256; k++) {
        uint32_t v = k;
        for (int j = 0; j < 8; j++) v = v & 1 ? 0xedb88320u ^ (v >> 1) : v >> 1;
        table[k] = v;
    }
    for (size_t i = 0; i < n; i++) c = table[(c ^ p[i]) & 0xff] ^ (c >> 8);
    return c;
}

static void be32(unsigned char *p, uint32_t v)
{
    p[0] = (unsigned char)(v >> 24), p[1] = (unsigned char)(v >> 16);
    p[2] = (unsigned char)(v >> 8), p[3] = (unsigned char)v;
}

size_t px_png_chunk(unsigned char *out, const char *type, const unsigned char *a, size_t na,
                    const unsigned char *b, size_t nb)
{
    be32(out, (uint32_t)(na + nb));
    memcpy(out + 4, type, 4);
    if (na) memcpy(out + 8, a, na);
    if (nb) memcpy(out + 8 + na, b, nb);
    be32(out + 8 + na + nb, crc_update(0xffffffffu, out + 4, 4 + na + nb) ^ 0xffffffffu);
    return 12 + na + nb;
}

size_t px_png_text_size(const char *const *keys, const char *const *vals, size_t n)
{
    size_t extra = 0;
    for (size_t k = 0; k < n; k++) extra += 12 + strlen(keys[k]) + 5 + strlen(vals[k]);
    return extra;
}

size_t px_png_text(unsigned char *out, const char *const *keys, const char *const *vals, size_t n)
{
    size_t o = 0;
    for (size_t k = 0; k < n; k++) {
        const char *key = keys[k], *val = vals[k];
        int ascii = 1;
        for (const char *c = val; *c; c++)
            if ((unsigned char)*c >= 0x80) ascii = 0;
        size_t kl = strlen(key), vl = strlen(val);
        /* keyword, its null separator, and for iTXt: compression flag and
         * method, empty language tag and translated keyword (PNG 11.3.4) */
        unsigned char head[PX_PNG_KEY_MAX + 5];
        memcpy(head, key, kl + 1);
        if (!ascii) memcpy(head + kl + 1, "\0\0\0\0", 4);
        o += px_png_chunk(out + o, ascii ? "tEXt" : "iTXt", head, kl + 1 + (ascii ? 0 : 4),
                          (const unsigned char *)val, vl);
    }
    return o;
}

int px_png_encode(const unsigned char *pix, int width, int height, int stride,
                  const char *const *keys, const char *const *vals, size_t nmeta,
                  unsigned char **out, size_t *nout)
{
    *out = NULL;
    *nout = 0;
    if (width < 1 || height < 1 || stride < 4 * width) return PX_EINVAL;
    for (size_t k = 0; k < nmeta; k++)
        if (strlen(keys[k]) > PX_PNG_KEY_MAX) return PX_EINVAL;
    size_t w = (size_t)width, h = (size_t)height;
    /* cairo's ARGB32: native-endian 32-bit words, alpha premultiplied.
     * Figures are opaque (white page): convert to RGB, and start again
     * as RGBA at the first pixel that is not. */
    int opaque = 1;
    size_t bpp = 3, row = 1 + w * bpp, nraw = row * h;
    unsigned char *raw = px_alloc(NULL, nraw);
    int32_t *head = px_alloc(NULL, sizeof *head << PX_LZ_HASH_BITS);
    codes *tab = px_alloc(NULL, sizeof *tab);
    unsigned char *zb = NULL;
    if (!raw || !head || !tab) {
        px_free(NULL, raw), px_free(NULL, head), px_free(NULL, tab), px_free(NULL, zb);
        return PX_ENOMEM;
    }
    for (size_t y = 0; y < h; y++) {
        const uint32_t *r = (const uint32_t *)(const void *)(pix + y * (size_t)stride);
        unsigned char *d = raw + y * row;
        *d++ = 0; /* filter type 0: the LZ77 repeats stand in for filtering */
        if (opaque) {
            uint32_t all = 0xffffffffu;
            for (size_t x = 0; x < w; x++) {
                uint32_t p = r[x];
                all &= p;
                d[0] = (unsigned char)(p >> 16), d[1] = (unsigned char)(p >> 8), d[2] = (unsigned char)p;
                d += 3;
            }
            if ((all >> 24) == 0xff) continue;
            opaque = 0; /* a pixel that is not opaque: RGBA from the first row */
            size_t old = nraw;
            bpp = 4, row = 1 + w * 4, nraw = row * h;
            unsigned char *g = px_realloc(NULL, raw, old, nraw);
            if (!g) {
                px_free(NULL, raw), px_free(NULL, head), px_free(NULL, tab), px_free(NULL, zb);
                return PX_ENOMEM;
            }
            raw = g;
            y = (size_t)-1; /* the loop's y++ makes it 0 */
            continue;
        }
        for (size_t x = 0; x < w; x++) {
            uint32_t p = r[x], a = p >> 24;
            uint32_t cr = (p >> 16) & 0xff, cg = (p >> 8) & 0xff, cb = p & 0xff;
            if (a != 0xff) { /* un-premultiply, rounding to nearest */
                if (a == 0) cr = cg = cb = 0;
                else {
                    cr = (cr * 255 + a / 2) / a;
                    cg = (cg * 255 + a / 2) / a;
                    cb = (cb * 255 + a / 2) / a;
                }
            }
            d[0] = (unsigned char)cr, d[1] = (unsigned char)cg, d[2] = (unsigned char)cb;
            d[3] = (unsigned char)a;
            d += 4;
        }
    }
    zb = px_alloc(NULL, nraw + nraw / 8 + 64); /* fixed codes: at most 9 bits a byte, and the frame */
    if (!zb) {
        px_free(NULL, raw), px_free(NULL, head), px_free(NULL, tab);
        return PX_ENOMEM;
    }
    size_t z = zlib_stream(raw, nraw, bpp, row, zb, head, tab);
    px_free(NULL, raw);
    px_free(NULL, head);
    px_free(NULL, tab);
    /* signature, IHDR, bKGD, the IDAT chunks, IEND and the text chunks */
    size_t cap = 8 + 25 + 18 + z + 12 * (z / PX_IDAT_MAX + 1) + 12 + px_png_text_size(keys, vals, nmeta);
    unsigned char *o = px_alloc(NULL, cap);
    if (!o) {
        px_free(NULL, zb);
        return PX_ENOMEM;
    }
    size_t n = 8;
    memcpy(o, "\x89PNG\r\n\x1a\n", 8);
    unsigned char ihdr[13];
    be32(ihdr, (uint32_t)w);
    be32(ihdr + 4, (uint32_t)h);
    ihdr[8] = 8;                  /* bit depth */
    ihdr[9] = opaque ? 2 : 6;     /* colour type: truecolour, with alpha when needed */
    ihdr[10] = ihdr[11] = ihdr[12] = 0; /* deflate, adaptive filtering, no interlace */
    n += px_png_chunk(o + n, "IHDR", ihdr, 13, NULL, 0);
    n += px_png_text(o + n, keys, vals, nmeta);
    /* background white, as cairo's writer sets it (PNG spec 11.3.5.1) */
    n += px_png_chunk(o + n, "bKGD", (const unsigned char *)"\0\xff\0\xff\0\xff", 6, NULL, 0);
    for (size_t at = 0; at < z; at += PX_IDAT_MAX)
        n += px_png_chunk(o + n, "IDAT", zb + at, z - at < PX_IDAT_MAX ? z - at : PX_IDAT_MAX, NULL, 0);
    n += px_png_chunk(o + n, "IEND", NULL, 0, NULL, 0);
    px_free(NULL, zb);
    *out = o;
    *nout = n;
    return PX_OK;
}
