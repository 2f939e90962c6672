/* backend.c - the output back end: a cairo surface per format (PNG image,
 * SVG or PDF stream into memory), the page drawn by draw.c, the status
 * checked once at the end (cairo errors are sticky), then per format: PNG
 * encoded by png.c with the metadata as text chunks (or cairo's writer on
 * the reference path), SVG rewritten by svgpass.c, PDF with pinned dates
 * and document information.  Files are written atomically.  Public
 * functions in render.h; the memory buffer in backend.h. */
#include "core/alloc.h"
#include "core/atomic.h"
#include "core/status.h"
#include "render/backend.h"
#include "render/layout.h"
#include "render/png.h"
#include "render/text.h"
#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <cairo.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define PX_PDF_FIXED_DATE "2000-01-01T00:00:00Z" /* pinned: same input, same bytes */

int px_format_from_path(const char *path)
{
    size_t n = path ? strlen(path) : 0;
    if (n >= 4 && strcmp(path + n - 4, ".png") == 0) return PX_FORMAT_PNG;
    if (n >= 4 && strcmp(path + n - 4, ".svg") == 0) return PX_FORMAT_SVG;
    if (n >= 4 && strcmp(path + n - 4, ".pdf") == 0) return PX_FORMAT_PDF;
    return -1;
}


cairo_status_t px_mem_write(void *closure, const unsigned char *data, unsigned int len)
{
    px_membuf *m = closure;
    if (m->n + len > m->cap) {
        size_t cap = m->cap ? m->cap : 65536;
        while (cap < m->n + len) cap *= 2;
        unsigned char *d = px_realloc(NULL, m->data, m->cap, cap);
        if (!d) {
            m->failed = 1;
            return CAIRO_STATUS_WRITE_ERROR;
        }
        m->data = d;
        m->cap = cap;
    }
    memcpy(m->data + m->n, data, len);
    m->n += len;
    return CAIRO_STATUS_SUCCESS;
}

/* Replace a buffer's bytes by a rewritten copy of n bytes (the rewriting
 * passes below build `out` from m->data, then hand it over here). */
int px_mem_replace(px_membuf *m, unsigned char *out, size_t n)
{
    px_free(NULL, m->data);
    m->data = out;
    m->n = n;
    m->cap = n;
    return PX_OK;
}

/* cairo names SVG groups "surfaceN" from a process-wide counter, so the
 * second identical figure of a run would differ in those names.  Renumber
 * them by first appearance (1, 2, ...) so identical inputs give identical
 * bytes whatever was drawn before. */

static const char *meta_get(const px_figure *f, const char *key)
{
    for (size_t k = 0; k < f->n_meta; k++)
        if (strcmp(f->meta_key[k], key) == 0) return f->meta_val[k];
    return NULL;
}

/* PDF document information: Title, Subject (Description, then Disclaimer),
 * Keywords. */
static void pdf_metadata(cairo_surface_t *s, const px_figure *f)
{
    const char *t = meta_get(f, "Title"), *d = meta_get(f, "Description");
    const char *c = meta_get(f, "Disclaimer"), *k = meta_get(f, "Keywords");
    if (t) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_TITLE, t);
    if (k) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_KEYWORDS, k);
    if (d || c) {
        px_strbuf b = {0};
        if (d) px_strbuf_put(&b, d, strlen(d));
        if (d && c) px_strbuf_put(&b, "\n", 1);
        if (c) px_strbuf_put(&b, c, strlen(c));
        if (!b.failed) cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_SUBJECT, b.s);
        px_free(NULL, b.s);
    }
}

/* A PDF surface writing to m, first page the figure's size: pinned dates
 * (same input, same bytes), creator, the figure's metadata. */
static cairo_surface_t *pdf_surface(px_membuf *m, const px_figure *f)
{
    cairo_surface_t *s = cairo_pdf_surface_create_for_stream(px_mem_write, m, f->width, px_page_height(f));
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATE_DATE, PX_PDF_FIXED_DATE);
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_MOD_DATE, PX_PDF_FIXED_DATE);
    cairo_pdf_surface_set_metadata(s, CAIRO_PDF_METADATA_CREATOR, "phlox");
    pdf_metadata(s, f);
    return s;
}

/* Finish and destroy the surface; on any failure (cst, the surface's own
 * sticky status, or m running out of memory) free m's bytes. */
static int finish_surface(cairo_surface_t *s, cairo_status_t cst, px_membuf *m)
{
    cairo_surface_finish(s);
    if (cst == CAIRO_STATUS_SUCCESS) cst = cairo_surface_status(s);
    cairo_surface_destroy(s);
    if (cst != CAIRO_STATUS_SUCCESS || m->failed) {
        px_free(NULL, m->data);
        m->data = NULL;
        return m->failed || cst == CAIRO_STATUS_NO_MEMORY ? PX_ENOMEM : PX_EIO;
    }
    return PX_OK;
}

/* The former PNG path: cairo's writer, then the figure's metadata as text
 * chunks inserted right after IHDR. */
#define PX_PNG_IHDR_END 33 /* 8-byte signature + IHDR (4 + 4 + 13 + 4) */
static int png_text_chunks(px_membuf *m, const px_figure *f)
{
    if (!f->n_meta) return PX_OK;
    if (m->n < PX_PNG_IHDR_END || memcmp(m->data + 12, "IHDR", 4) != 0) return PX_EIO;
    const char *const *keys = (const char *const *)f->meta_key;
    const char *const *vals = (const char *const *)f->meta_val;
    unsigned char *out = px_alloc(NULL, m->n + px_png_text_size(keys, vals, f->n_meta));
    if (!out) return PX_ENOMEM;
    memcpy(out, m->data, PX_PNG_IHDR_END);
    size_t o = PX_PNG_IHDR_END + px_png_text(out + PX_PNG_IHDR_END, keys, vals, f->n_meta);
    memcpy(out + o, m->data + PX_PNG_IHDR_END, m->n - PX_PNG_IHDR_END);
    o += m->n - PX_PNG_IHDR_END;
    return px_mem_replace(m, out, o);
}

/* The image surface as PNG by png.c, metadata included. */
static int png_write(cairo_surface_t *s, px_membuf *m, const px_figure *f)
{
    cairo_surface_flush(s);
    const unsigned char *pix = cairo_image_surface_get_data(s);
    if (!pix || cairo_image_surface_get_format(s) != CAIRO_FORMAT_ARGB32) return PX_EIO;
    return px_png_encode(pix, cairo_image_surface_get_width(s), cairo_image_surface_get_height(s),
                         cairo_image_surface_get_stride(s), (const char *const *)f->meta_key,
                         (const char *const *)f->meta_val, f->n_meta, &m->data, &m->n);
}

int px_figure_render(const px_figure *f, px_format fmt, double dpi, unsigned char **out, size_t *n)
{
    if (!f || !out || !n || !(dpi >= 10 && dpi <= 2400)) return PX_EINVAL;
    *out = NULL;
    *n = 0;
    px_membuf m = {0};
    cairo_surface_t *s;
    double scale = fmt == PX_FORMAT_PNG ? dpi / 72.0 : 1.0;
    switch (fmt) {
    case PX_FORMAT_PNG:
        s = cairo_image_surface_create(CAIRO_FORMAT_ARGB32, (int)lround(f->width * scale),
                                       (int)lround(px_page_height(f) * scale));
        break;
    case PX_FORMAT_SVG:
        s = cairo_svg_surface_create_for_stream(px_mem_write, &m, f->width, px_page_height(f));
        break;
    case PX_FORMAT_PDF: s = pdf_surface(&m, f); break;
    default: return PX_EINVAL;
    }
    cairo_t *cr = cairo_create(s);
    px_text_prepare(cr);
    px_text_sink sink = {0};
    if (fmt == PX_FORMAT_SVG && f->svg_text == PX_SVG_TEXT_TEXT) px_text_sink_attach(cr, &sink);
    cairo_scale(cr, scale, scale);
    if (fmt == PX_FORMAT_PDF && f->page_per_panel) {
        for (int i = 0; i < f->used; i++) {
            px_draw_page(cr, f, i, NULL);
            cairo_show_page(cr);
        }
    } else {
        px_draw_page(cr, f, -1, NULL);
    }
    cairo_status_t cst = cairo_status(cr);
    cairo_destroy(cr);
    int pst = PX_OK;
    if (fmt == PX_FORMAT_PNG && cst == CAIRO_STATUS_SUCCESS) {
        if (f->reference_output) {
            cairo_surface_flush(s);
            cst = cairo_surface_write_to_png_stream(s, px_mem_write, &m);
        } else {
            pst = png_write(s, &m, f);
        }
    }
    int fst = finish_surface(s, cst, &m);
    if (fst != PX_OK || pst != PX_OK) {
        px_text_sink_free(&sink);
        if (fst == PX_OK) px_free(NULL, m.data);
        return fst != PX_OK ? fst : pst;
    }
    if (fmt == PX_FORMAT_PNG && f->reference_output) {
        int st = png_text_chunks(&m, f);
        if (st != PX_OK) {
            px_free(NULL, m.data);
            return st;
        }
    }
    if (fmt == PX_FORMAT_SVG) {
        int st = px_svg_renumber(&m);
        if (st == PX_OK) st = px_svg_compact(&m, f->reference_output);
        if (st == PX_OK && f->svg_text == PX_SVG_TEXT_TEXT) { /* after rounding: text is not numbers */
            unsigned char *t;
            size_t nt;
            st = px_text_sink_splice(&sink, m.data, m.n, &t, &nt);
            if (st == PX_OK) {
                px_free(NULL, m.data);
                m.data = t, m.n = nt, m.cap = nt;
            }
        }
        px_text_sink_free(&sink);
        if (st == PX_OK) st = px_svg_describe(&m, f);
        if (st != PX_OK) {
            px_free(NULL, m.data);
            return st;
        }
    }
    *out = m.data;
    *n = m.n;
    return PX_OK;
}

int px_figure_save(const px_figure *f, const char *path, double dpi)
{
    int fmt = px_format_from_path(path);
    if (fmt < 0) return PX_EINVAL;
    unsigned char *data;
    size_t n;
    int st = px_figure_render(f, (px_format)fmt, dpi, &data, &n);
    if (st != PX_OK) return st;
    st = px_write_atomic(path, data, n, NULL);
    px_free(NULL, data);
    return st;
}

int px_figures_save_pdf(const px_figure *const *figs, size_t n, const char *path)
{
    if (!figs || n == 0 || !path) return PX_EINVAL;
    for (size_t i = 0; i < n; i++)
        if (!figs[i]) return PX_EINVAL;
    px_membuf m = {0};
    cairo_surface_t *s = pdf_surface(&m, figs[0]);
    cairo_t *cr = cairo_create(s);
    px_text_prepare(cr);
    for (size_t i = 0; i < n; i++) {
        cairo_pdf_surface_set_size(s, figs[i]->width, px_page_height(figs[i]));
        px_draw_page(cr, figs[i], -1, NULL);
        cairo_show_page(cr);
    }
    cairo_status_t cst = cairo_status(cr);
    cairo_destroy(cr);
    int st = finish_surface(s, cst, &m);
    if (st != PX_OK) return st;
    st = px_write_atomic(path, m.data, m.n, NULL);
    px_free(NULL, m.data);
    return st;
}
