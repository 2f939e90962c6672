/* png.h - private: the PNG writer of figures (png.c). */
#ifndef PX_RENDER_PNG_H
#define PX_RENDER_PNG_H
#include <stddef.h>

#define PX_PNG_KEY_MAX 79 /* PNG keyword length limit (PNG spec 11.3.4.2) */

/* PNG of a cairo ARGB32 image (width x height pixels, `stride` bytes a
 * row): 8-bit RGB when every pixel is opaque, else RGBA un-premultiplied;
 * the nmeta key/value pairs as text chunks after IHDR (px_png_text).
 * *out is malloc'd (caller frees). */
int px_png_encode(const unsigned char *pix, int width, int height, int stride,
                  const char *const *keys, const char *const *vals, size_t nmeta,
                  unsigned char **out, size_t *nout);
/* One chunk (length, type, data a then b, CRC) at out; returns its size. */
size_t px_png_chunk(unsigned char *out, const char *type, const unsigned char *a, size_t na,
                    const unsigned char *b, size_t nb);
/* Text chunks: tEXt for ASCII values, iTXt (UTF-8, uncompressed) otherwise
 * (PNG spec 11.3.4); px_png_text_size is the room they take. */
size_t px_png_text_size(const char *const *keys, const char *const *vals, size_t n);
size_t px_png_text(unsigned char *out, const char *const *keys, const char *const *vals, size_t n);

#endif
