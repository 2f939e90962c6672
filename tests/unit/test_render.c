/* test_render.c - the figure module: tick choice, label geometry, the three
 * output formats, pixel probes away from text, deterministic vector bytes. */
#include "px_test.h"
#include "support/px_rng.h"
#include "core/status.h"
#include "render/png.h"
#include "render/render.h"
#include <cairo.h>
#include <math.h>
#include <stdlib.h>
#include <limits.h>
#include <string.h>

static void test_ticks(void **state)
{
    (void)state;
    double t[16];
    /* 0..14 in at most 9 ticks: steps of 2 (1-2-5 rule, Heckbert 1990) */
    size_t n = px_ticks_linear(0, 14, 9, t);
    assert_int_equal(n, 8);
    assert_close(t[0], 0, 0, 1e-12);
    assert_close(t[7], 14, 0, 1e-12);
    /* -2..2 V: 0.5 steps, 0 is exactly zero (no -0 or 1e-17) */
    n = px_ticks_linear(-2, 2, 9, t);
    assert_int_equal(n, 9);
    assert_true(t[4] == 0.0);
    assert_close(t[1], -1.5, 0, 1e-12);
    /* reversed and degenerate ranges */
    n = px_ticks_linear(2, -2, 9, t);
    assert_true(n >= 2 && t[0] < t[n - 1]);
    assert_int_equal(px_ticks_linear(NAN, 1, 9, t), 0);
    /* log axis 1e-12..1: decades, thinned to fit */
    n = px_ticks_log(1e-12, 1, 7, t);
    assert_true(n >= 4 && n <= 7);
    assert_close(t[0], 1e-12, 1e-9, 0);
    /* a short log range gets 1-2-5 ticks */
    n = px_ticks_log(1, 100, 9, t);
    assert_int_equal(n, 7); /* 1 2 5 10 20 50 100 */
    assert_int_equal(px_ticks_log(-1, 10, 9, t), 0);
}

static px_figure *two_fields(void)
{
    px_figure *f = px_figure_new(400, 300, 1, 1);
    assert_non_null(f);
    assert_int_equal(px_figure_axes(f, 0, 0, 14, -1, 1, 0, 0), PX_OK);
    assert_int_equal(px_figure_titles(f, 0, "pH", "E / V vs SHE", "test"), PX_OK);
    double x1[] = {0, 7, 7, 0}, y1[] = {-1, -1, 1, 1};
    double x2[] = {7, 14, 14, 7}, y2[] = {-1, -1, 1, 1};
    px_rgba blue = {0.2, 0.4, 0.8, 1}, sand = {0.9, 0.8, 0.6, 1}, black = {0, 0, 0, 1};
    assert_int_equal(px_figure_polygon(f, 0, x1, y1, 4, blue, black, 0.5, "Fe^2+", 1, 0.8), PX_OK);
    assert_int_equal(px_figure_polygon(f, 0, x2, y2, 4, sand, black, 0.5, "Fe(OH)3(s)", 13, 0.8), PX_OK);
    double lx[] = {0, 14}, ly[] = {-0.5, -0.5};
    px_rgba red = {1, 0, 0, 1};
    assert_int_equal(px_figure_line(f, 0, lx, ly, 2, red, 3, PX_DASH_SOLID, NULL), PX_OK);
    assert_int_equal(px_figure_stamp(f, "stamp line"), PX_OK);
    return f;
}

typedef struct {
    const unsigned char *p;
    size_t n, at;
} reader;

typedef struct {
    unsigned char *p;
    size_t n;
} membuf_t;

static cairo_status_t membuf_write(void *closure, const unsigned char *data, unsigned int len)
{
    membuf_t *m = closure;
    unsigned char *q = realloc(m->p, m->n + len);
    if (!q) return CAIRO_STATUS_NO_MEMORY;
    memcpy(q + m->n, data, len);
    m->p = q;
    m->n += len;
    return CAIRO_STATUS_SUCCESS;
}

static cairo_status_t read_mem(void *closure, unsigned char *data, unsigned int len)
{
    reader *r = closure;
    if (r->at + len > r->n) return CAIRO_STATUS_READ_ERROR;
    memcpy(data, r->p + r->at, len);
    r->at += len;
    return CAIRO_STATUS_SUCCESS;
}

static void probe(cairo_surface_t *s, double x, double y, int *r, int *g, int *b)
{
    unsigned char *d = cairo_image_surface_get_data(s);
    int stride = cairo_image_surface_get_stride(s);
    uint32_t px = *(uint32_t *)(d + (int)y * stride + (int)x * 4);
    *r = (px >> 16) & 255;
    *g = (px >> 8) & 255;
    *b = px & 255;
}

static void test_png_pixels(void **state)
{
    (void)state;
    px_figure *f = two_fields();
    unsigned char *png;
    size_t n;
    const double dpi = 144; /* 2 pixels per point */
    assert_int_equal(px_figure_render(f, PX_FORMAT_PNG, dpi, &png, &n), PX_OK);
    assert_memory_equal(png, "\x89PNG\r\n\x1a\n", 8);
    reader rd = {png, n, 0};
    cairo_surface_t *s = cairo_image_surface_create_from_png_stream(read_mem, &rd);
    assert_int_equal(cairo_surface_status(s), CAIRO_STATUS_SUCCESS);
    assert_int_equal(cairo_image_surface_get_width(s), 800);
    assert_int_equal(cairo_image_surface_get_height(s), 600);
    double x, y, w, h;
    assert_int_equal(px_figure_plot_rect(f, 0, dpi, &x, &y, &w, &h), PX_OK);
    int r, g, b;
    /* well inside the first field (pH 3, E 0.3): its fill (0.2, 0.4, 0.8) */
    probe(s, x + w * 3 / 14, y + h * (1 - 1.3 / 2), &r, &g, &b);
    assert_true(abs(r - 51) <= 1 && abs(g - 102) <= 1 && abs(b - 204) <= 1);
    /* inside the second field (pH 10, E 0.3) */
    probe(s, x + w * 10 / 14, y + h * (1 - 1.3 / 2), &r, &g, &b);
    assert_true(abs(r - 230) <= 1 && abs(g - 204) <= 1 && abs(b - 153) <= 1);
    /* on the red line at E = -0.5 (pH 5) */
    probe(s, x + w * 5 / 14, y + h * (1 - 0.5 / 2), &r, &g, &b);
    assert_true(r >= 250 && g <= 5 && b <= 5);
    cairo_surface_destroy(s);
    free(png);
    px_figure_free(f);
}

/* A PNG decoded by cairo's reader (libpng) into an image surface. */
static cairo_surface_t *decode(const unsigned char *png, size_t n)
{
    reader rd = {png, n, 0};
    cairo_surface_t *s = cairo_image_surface_create_from_png_stream(read_mem, &rd);
    assert_int_equal(cairo_surface_status(s), CAIRO_STATUS_SUCCESS);
    cairo_surface_flush(s);
    return s;
}

static void assert_same_pixels(cairo_surface_t *a, cairo_surface_t *b)
{
    int w = cairo_image_surface_get_width(a), h = cairo_image_surface_get_height(a);
    assert_int_equal(cairo_image_surface_get_width(b), w);
    assert_int_equal(cairo_image_surface_get_height(b), h);
    assert_int_equal(cairo_image_surface_get_format(a), cairo_image_surface_get_format(b));
    for (int y = 0; y < h; y++)
        assert_memory_equal(cairo_image_surface_get_data(a) + y * cairo_image_surface_get_stride(a),
                            cairo_image_surface_get_data(b) + y * cairo_image_surface_get_stride(b),
                            (size_t)w * 4);
}

static int has_bytes(const unsigned char *p, size_t n, const char *s)
{
    size_t k = strlen(s);
    for (size_t i = 0; i + k <= n; i++)
        if (memcmp(p + i, s, k) == 0) return 1;
    return 0;
}

/* The chunks of a PNG other than IDAT (type and data), concatenated: the
 * header, text chunks and background must match cairo's writer's. */
static size_t non_idat(const unsigned char *p, size_t n, unsigned char *out)
{
    size_t o = 0;
    for (size_t at = 8; at + 12 <= n;) {
        size_t len = (size_t)p[at] << 24 | (size_t)p[at + 1] << 16 | (size_t)p[at + 2] << 8 | p[at + 3];
        if (memcmp(p + at + 4, "IDAT", 4) != 0) {
            memcpy(out + o, p + at + 4, 4 + len);
            o += 4 + len;
        }
        at += 12 + len;
    }
    return o;
}

/* The PNG writer of png.c against cairo's (the former path): the same
 * pixels through libpng's decoder and the same chunks besides the image
 * data, for a figure with non-ASCII metadata (iTXt) and ASCII (tEXt). */
static void test_png_writer(void **state)
{
    (void)state;
    px_figure *f = two_fields();
    assert_int_equal(px_figure_meta(f, "Title", "Fe\xe2\x80\x93H2O at 25 \xc2\xb0" "C"), PX_OK);
    assert_int_equal(px_figure_meta(f, "Software", "phlox test"), PX_OK);
    unsigned char *fast, *ref;
    size_t nf, nr;
    assert_int_equal(px_figure_render(f, PX_FORMAT_PNG, 144, &fast, &nf), PX_OK);
    assert_int_equal(px_figure_reference_output(f, 1), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_PNG, 144, &ref, &nr), PX_OK);
    cairo_surface_t *a = decode(fast, nf), *b = decode(ref, nr);
    assert_same_pixels(a, b);
    unsigned char *ca = malloc(nf), *cb = malloc(nr);
    assert_non_null(ca);
    assert_non_null(cb);
    size_t la = non_idat(fast, nf, ca), lb = non_idat(ref, nr, cb);
    assert_int_equal(la, lb);
    assert_memory_equal(ca, cb, la);
    assert_true(has_bytes(ca, la, "iTXtTitle"));
    assert_true(has_bytes(ca, la, "tEXtSoftware"));
    free(ca), free(cb), free(fast), free(ref);
    cairo_surface_destroy(a);
    cairo_surface_destroy(b);
    px_figure_free(f);
}

/* Transparent and translucent pixels (RGBA, un-premultiplied), long runs
 * and noise (matches at every distance, literals): what libpng decodes
 * from png.c's bytes equals what it decodes from cairo's writer's. */
static void test_png_encode_alpha(void **state)
{
    (void)state;
    const int w = 301, h = 97;
    cairo_surface_t *s = cairo_image_surface_create(CAIRO_FORMAT_ARGB32, w, h);
    unsigned char *d = cairo_image_surface_get_data(s);
    int stride = cairo_image_surface_get_stride(s);
    px_rng rng;
    px_rng_seed(&rng, 12345);
    for (int y = 0; y < h; y++)
        for (int x = 0; x < w; x++) {
            uint32_t a, r, g, b;
            uint32_t seed = (uint32_t)(px_rng_uniform(&rng) * 4294967296.0);
            if (y < 30) a = 255, r = 40, g = 90, b = 200;            /* flat */
            else if (y < 60) a = (uint32_t)(x * 255 / (w - 1)), r = g = b = a / 2; /* ramp */
            else a = seed >> 24, r = (seed >> 8) & 0xff, g = (seed >> 16) & 0xff, b = seed & 0xff;
            if (r > a) r = a; /* premultiplied: no channel above alpha */
            if (g > a) g = a;
            if (b > a) b = a;
            *(uint32_t *)(void *)(d + y * stride + x * 4) = a << 24 | r << 16 | g << 8 | b;
        }
    cairo_surface_mark_dirty(s);
    const char *keys[] = {"Comment"}, *vals[] = {"alpha test"};
    unsigned char *png;
    size_t n;
    assert_int_equal(px_png_encode(d, w, h, stride, keys, vals, 1, &png, &n), PX_OK);
    membuf_t ref = {0};
    assert_int_equal(cairo_surface_write_to_png_stream(s, membuf_write, &ref), CAIRO_STATUS_SUCCESS);
    cairo_surface_t *a = decode(png, n), *b = decode(ref.p, ref.n);
    assert_same_pixels(a, b);
    assert_true(has_bytes(png, n, "tEXtComment"));
    free(png);
    assert_int_equal(px_png_encode(d, 0, h, stride, keys, vals, 1, &png, &n), PX_EINVAL);
    assert_null(png);
    free(ref.p);
    cairo_surface_destroy(a);
    cairo_surface_destroy(b);
    cairo_surface_destroy(s);
}

/* SVG numbers rounded as text equal those rounded by strtod and printf
 * (the former path): a figure of many pseudo-random points, so thousands
 * of numbers with carries (x.9996), ties and negative zeros are rounded. */
static void test_svg_rounding(void **state)
{
    (void)state;
    px_figure *f = two_fields();
    double x[2000], y[2000];
    px_rng rng;
    px_rng_seed(&rng, 777);
    for (int i = 0; i < 2000; i++) {
        x[i] = 14.0 * px_rng_uniform(&rng);
        y[i] = -1 + 2.0 * px_rng_uniform(&rng);
    }
    px_rgba grey = {0.5, 0.5, 0.5, 1};
    assert_int_equal(px_figure_line(f, 0, x, y, 2000, grey, 0.3, PX_DASH_SOLID, NULL), PX_OK);
    unsigned char *fast, *ref;
    size_t nf, nr;
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &fast, &nf), PX_OK);
    assert_int_equal(px_figure_reference_output(f, 1), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &ref, &nr), PX_OK);
    assert_int_equal(nf, nr);
    assert_memory_equal(fast, ref, nf);
    free(fast), free(ref);
    /* and with text as glyph outlines, where most numbers are */
    assert_int_equal(px_figure_svg_text(f, PX_SVG_TEXT_OUTLINE), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &ref, &nr), PX_OK);
    assert_int_equal(px_figure_reference_output(f, 0), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &fast, &nf), PX_OK);
    assert_int_equal(nf, nr);
    assert_memory_equal(fast, ref, nf);
    free(fast), free(ref);
    px_figure_free(f);
}

/* SVG text: every marker replaced by its <text>, none left; the outline
 * path has glyphs and no <text>; an unknown mode is refused. */
static void test_svg_text(void **state)
{
    (void)state;
    px_figure *f = two_fields();
    unsigned char *t, *o;
    size_t nt, no;
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &t, &nt), PX_OK);
    assert_int_equal(px_figure_svg_text(f, PX_SVG_TEXT_OUTLINE), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &o, &no), PX_OK);
    assert_int_equal(px_figure_svg_text(f, (px_svg_text)7), PX_EINVAL);
    char *ts = malloc(nt + 1), *os = malloc(no + 1);
    assert_non_null(ts);
    assert_non_null(os);
    memcpy(ts, t, nt), ts[nt] = '\0';
    memcpy(os, o, no), os[no] = '\0';
    assert_non_null(strstr(ts, "<text "));
    assert_non_null(strstr(ts, "font-family=\"DejaVu Sans\""));
    assert_null(strstr(ts, "fill:rgb(1%,")); /* no marker left */
    assert_null(strstr(ts, "<symbol"));
    assert_null(strstr(os, "<text"));
    assert_non_null(strstr(os, "<symbol"));
    assert_true(nt < no);
    free(ts), free(os), free(t), free(o);
    px_figure_free(f);
}

static void test_vector_outputs(void **state)
{
    (void)state;
    px_figure *f = two_fields();
    unsigned char *a, *b;
    size_t na, nb;
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &a, &na), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_SVG, 72, &b, &nb), PX_OK);
    assert_int_equal(na, nb);
    assert_memory_equal(a, b, na); /* identical inputs, identical bytes */
    assert_non_null(strstr((const char *)a, "<svg"));
    free(a);
    free(b);
    assert_int_equal(px_figure_render(f, PX_FORMAT_PDF, 72, &a, &na), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_PDF, 72, &b, &nb), PX_OK);
    assert_memory_equal(a, "%PDF-", 5);
    assert_int_equal(na, nb);
    assert_memory_equal(a, b, na);
    free(a);
    free(b);
    px_figure_free(f);

    /* one page per panel */
    f = px_figure_new(600, 300, 1, 3);
    assert_int_equal(px_figure_page_per_panel(f, 1), PX_OK);
    assert_int_equal(px_figure_render(f, PX_FORMAT_PDF, 72, &a, &na), PX_OK);
    int pages = 0;
    for (size_t i = 0; i + 11 < na; i++)
        if (memcmp(a + i, "/Type /Page", 11) == 0 && a[i + 11] != 's') pages++;
    assert_int_equal(pages, 3);
    free(a);
    px_figure_free(f);
}

static void test_bad_input(void **state)
{
    /* rows * cols overflowing int must not slip under the panel limit
     * (65536 * 65536 wraps to 0 in 32-bit arithmetic) */
    assert_null(px_figure_new(400, 300, 65536, 65536));
    assert_null(px_figure_new(400, 300, INT_MAX, 2));
    assert_null(px_figure_new(400, 300, 2, INT_MAX));
    (void)state;
    assert_null(px_figure_new(0, 100, 1, 1));
    assert_null(px_figure_new(100, 100, 0, 1));
    px_figure *f = px_figure_new(200, 200, 1, 2);
    double x[] = {0, 1, NAN}, y[] = {0, 1, 1};
    px_rgba c = {0, 0, 0, 1}, bad = {2, 0, 0, 1};
    assert_int_equal(px_figure_axes(f, 2, 0, 1, 0, 1, 0, 0), PX_EINVAL);
    assert_int_equal(px_figure_axes(f, 0, 0, 0, 0, 1, 0, 0), PX_EINVAL);
    assert_int_equal(px_figure_axes(f, 0, -1, 1, 0, 1, 1, 0), PX_EINVAL);
    assert_int_equal(px_figure_polygon(f, 0, x, y, 3, c, c, 1, NULL, 0, 0), PX_EINVAL);
    assert_int_equal(px_figure_line(f, 0, y, y, 3, bad, 1, PX_DASH_SOLID, NULL), PX_EINVAL);
    assert_int_equal(px_format_from_path("a.jpg"), -1);
    assert_int_equal(px_figure_save(f, "a.jpg", 72), PX_EINVAL);
    assert_int_equal(px_figure_save(f, "/nonexistent-dir/a.svg", 72), PX_EIO);
    px_figure_free(f);
    px_figure_free(NULL);
}

/* The layout, on invented geometry: a big square field holds its label, a
 * sliver gets it led out, a label along the plot's diagonal runs at the
 * diagonal's angle as drawn, and only the used panels are drawn. */
static void test_layout(void **state)
{
    (void)state;
    px_figure *f = px_figure_new(300, 300, 1, 2);
    assert_non_null(f);
    assert_int_equal(px_figure_panels_used(f, 1), PX_OK);
    assert_int_equal(px_figure_axes(f, 0, 0, 10, 0, 10, 0, 0), PX_OK);
    px_rgba grey = {0.8, 0.8, 0.8, 1}, ink = {0, 0, 0, 1};
    double bx[] = {0, 10, 10, 0}, by[] = {0, 0, 5, 5};
    double sx[] = {0, 10, 10, 0}, sy[] = {5, 5, 5.05, 5.05};
    assert_int_equal(px_figure_polygon(f, 0, bx, by, 4, grey, ink, 0, "Big(s)", NAN, NAN), PX_OK);
    assert_int_equal(px_figure_polygon(f, 0, sx, sy, 4, grey, ink, 0, "Thin^2+", NAN, NAN), PX_OK);
    double lx[] = {0, 10}, ly[] = {0, 10};
    assert_int_equal(px_figure_line_label(f, 0, lx, ly, 2, "along", NULL, 0, 7, ink, 0.8), PX_OK);
    px_label_box *b;
    size_t n;
    assert_int_equal(px_figure_layout(f, &b, &n), PX_OK);
    int big = 0, thin = 0, along = 0, other_panel = 0;
    for (size_t i = 0; i < n; i++) {
        if (b[i].panel == 1) other_panel = 1;
        if (strcmp(b[i].text, "Big(s)") == 0) big = b[i].kind == PX_LABEL_FIELD;
        if (strcmp(b[i].text, "Thin^2+") == 0) thin = b[i].kind == PX_LABEL_LEADER;
        if (strcmp(b[i].text, "along") == 0) {
            along = b[i].placed;
            /* the angle follows the slope as drawn (the plot is not square) */
            double x, y, w, h;
            assert_int_equal(px_figure_plot_rect(f, 0, 72, &x, &y, &w, &h), PX_OK);
            assert_close(b[i].angle, atan2(h, w) * 180 / 3.14159265358979323846, 0, 1e-9);
        }
    }
    assert_true(big && thin && along && !other_panel);
    px_figure_layout_free(b, n);
    /* metadata keys follow the PNG keyword rules */
    assert_int_equal(px_figure_meta(f, "", "x"), PX_EINVAL);
    assert_int_equal(px_figure_meta(f, " Title", "x"), PX_EINVAL);
    assert_int_equal(px_figure_meta(f, "Ti\ntle", "x"), PX_EINVAL);
    assert_int_equal(px_figure_meta(f, "Title", "x"), PX_OK);
    assert_int_equal(px_figure_meta(f, "Title", "y"), PX_OK); /* replaced */
    assert_int_equal(px_figure_scale(f, 0.1, 1), PX_EINVAL);
    assert_int_equal(px_figure_panels_used(f, 3), PX_EINVAL);
    px_figure_free(f);
}

int main(void)
{
    const struct CMUnitTest tests[] = {
        cmocka_unit_test(test_ticks),         cmocka_unit_test(test_png_pixels),    cmocka_unit_test(test_vector_outputs),
        cmocka_unit_test(test_bad_input),     cmocka_unit_test(test_layout),
        cmocka_unit_test(test_png_writer),    cmocka_unit_test(test_png_encode_alpha),
        cmocka_unit_test(test_svg_rounding),
        cmocka_unit_test(test_svg_text),
    };
    return cmocka_run_group_tests(tests, NULL, NULL);
}
