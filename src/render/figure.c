/* figure.c - the figure model: panels and the items drawn in them, kept as
 * plain data until px_figure_save() lays them out (layout.c, labels.c) and
 * draws them (draw.c, backend.c). */
#include "core/alloc.h"
#include "render/figure_priv.h"
#include "core/status.h"
#include "render/png.h"
#include <math.h>
#include <stdlib.h>
#include <string.h>

#define PX_FIG_MAX_PANELS 64

static char *dupstr(const char *s) { return s ? px_strdup(NULL, s) : NULL; }

px_figure *px_figure_new(double width, double height, int rows, int cols)
{
    /* rows * cols is not formed before both are known small (int overflow) */
    if (!(width >= 50 && height >= 50 && width <= 20000 && height <= 20000) || rows < 1 ||
        cols < 1 || rows > PX_FIG_MAX_PANELS || cols > PX_FIG_MAX_PANELS / rows)
        return NULL;
    px_figure *f = px_calloc(NULL, 1, sizeof *f);
    if (!f) return NULL;
    f->panels = px_calloc(NULL, (size_t)(rows * cols), sizeof *f->panels);
    if (!f->panels) {
        px_free(NULL, f);
        return NULL;
    }
    f->width = width;
    f->height = height;
    f->rows = rows;
    f->cols = cols;
    f->used = rows * cols;
    f->ts = f->ls = 1.0;
    for (int i = 0; i < rows * cols; i++) {
        px_panel *p = &f->panels[i];
        p->x0 = 0, p->x1 = 1, p->y0 = 0, p->y1 = 1;
    }
    return f;
}

static void free_item(px_item *it)
{
    px_free(NULL, it->x);
    px_free(NULL, it->y);
    px_free(NULL, it->text);
    px_free(NULL, it->alt);
}

void px_figure_free(px_figure *f)
{
    if (!f) return;
    for (int i = 0; i < f->rows * f->cols; i++) {
        px_panel *p = &f->panels[i];
        for (size_t k = 0; k < p->n_items; k++) free_item(&p->items[k]);
        px_free(NULL, p->items);
        px_free(NULL, p->xlabel);
        px_free(NULL, p->ylabel);
        px_free(NULL, p->title);
    }
    for (size_t k = 0; k < f->n_stamp; k++) px_free(NULL, f->stamp[k]);
    px_free(NULL, f->stamp);
    for (size_t k = 0; k < f->n_meta; k++) {
        px_free(NULL, f->meta_key[k]);
        px_free(NULL, f->meta_val[k]);
    }
    px_free(NULL, f->meta_key);
    px_free(NULL, f->meta_val);
    px_free(NULL, f->panels);
    px_free(NULL, f);
}

static px_panel *panel_of(px_figure *f, int panel)
{
    if (!f || panel < 0 || panel >= f->rows * f->cols) return NULL;
    return &f->panels[panel];
}

int px_figure_axes(px_figure *f, int panel, double x0, double x1, double y0, double y1, int xlog,
                   int ylog)
{
    px_panel *p = panel_of(f, panel);
    if (!p) return PX_EINVAL;
    if (!(isfinite(x0) && isfinite(x1) && isfinite(y0) && isfinite(y1)) || x0 == x1 || y0 == y1)
        return PX_EINVAL;
    if ((xlog && (x0 <= 0 || x1 <= 0)) || (ylog && (y0 <= 0 || y1 <= 0))) return PX_EINVAL;
    p->x0 = x0, p->x1 = x1, p->y0 = y0, p->y1 = y1;
    p->xlog = xlog != 0, p->ylog = ylog != 0;
    return PX_OK;
}

static int replace(char **slot, const char *s)
{
    char *d = NULL;
    if (s && !(d = dupstr(s))) return PX_ENOMEM;
    px_free(NULL, *slot);
    *slot = d;
    return PX_OK;
}

int px_figure_titles(px_figure *f, int panel, const char *xlabel, const char *ylabel,
                     const char *title)
{
    px_panel *p = panel_of(f, panel);
    if (!p) return PX_EINVAL;
    int st = replace(&p->xlabel, xlabel);
    if (st == PX_OK) st = replace(&p->ylabel, ylabel);
    if (st == PX_OK) st = replace(&p->title, title);
    return st;
}

static px_item *new_item(px_panel *p)
{
    px_item *grown = px_grow(NULL, p->items, &p->cap, p->n_items + 1, sizeof *grown, 16);
    if (!grown) return NULL;
    p->items = grown;
    px_item *it = &p->items[p->n_items];
    memset(it, 0, sizeof *it);
    return it;
}

static int valid_color(px_rgba c)
{
    return c.r >= 0 && c.r <= 1 && c.g >= 0 && c.g <= 1 && c.b >= 0 && c.b <= 1 && c.a >= 0 &&
           c.a <= 1;
}

static int copy_points(px_item *it, const double *x, const double *y, size_t n)
{
    for (size_t i = 0; i < n; i++)
        if (!isfinite(x[i]) || !isfinite(y[i])) return PX_EINVAL;
    it->x = px_alloc(NULL, n * sizeof *x);
    it->y = px_alloc(NULL, n * sizeof *y);
    if (!it->x || !it->y) {
        px_free(NULL, it->x);
        px_free(NULL, it->y);
        it->x = it->y = NULL;
        return PX_ENOMEM;
    }
    memcpy(it->x, x, n * sizeof *x);
    memcpy(it->y, y, n * sizeof *y);
    it->n = n;
    return PX_OK;
}

int px_figure_polygon(px_figure *f, int panel, const double *x, const double *y, size_t n,
                      px_rgba fill, px_rgba stroke, double stroke_width, const char *label,
                      double lx, double ly)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !x || !y || n < 3 || !valid_color(fill) || !valid_color(stroke) ||
        !(stroke_width >= 0))
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    int st = copy_points(it, x, y, n);
    if (st != PX_OK) return st;
    if (label && !(it->text = dupstr(label))) {
        free_item(it);
        return PX_ENOMEM;
    }
    it->kind = PX_ITEM_POLYGON;
    it->fill = fill;
    it->color = stroke;
    it->width = stroke_width;
    it->lx = lx;
    it->ly = ly;
    p->n_items++;
    return PX_OK;
}

int px_figure_line(px_figure *f, int panel, const double *x, const double *y, size_t n,
                   px_rgba color, double width, px_dash dash, const char *legend)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !x || !y || n < 2 || !valid_color(color) || !(width > 0) || dash < PX_DASH_SOLID ||
        dash > PX_DASH_DASHDOT)
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    int st = copy_points(it, x, y, n);
    if (st != PX_OK) return st;
    if (legend && !(it->text = dupstr(legend))) {
        free_item(it);
        return PX_ENOMEM;
    }
    it->kind = PX_ITEM_LINE;
    it->color = color;
    it->width = width;
    it->dash = dash;
    p->n_items++;
    return PX_OK;
}

int px_figure_text(px_figure *f, int panel, double x, double y, const char *text, int chem,
                   double size, px_rgba color)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !text || !isfinite(x) || !isfinite(y) || !(size > 0 && size < 200) ||
        !valid_color(color))
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    if (!(it->text = dupstr(text))) return PX_ENOMEM;
    it->kind = PX_ITEM_TEXT;
    it->lx = x;
    it->ly = y;
    it->chem = chem != 0;
    it->width = size;
    it->color = color;
    p->n_items++;
    return PX_OK;
}

int px_figure_stamp(px_figure *f, const char *text)
{
    if (!f || !text) return PX_EINVAL;
    char **s = px_realloc(NULL, f->stamp, f->n_stamp * sizeof *s, (f->n_stamp + 1) * sizeof *s);
    if (!s) return PX_ENOMEM;
    f->stamp = s;
    if (!(s[f->n_stamp] = dupstr(text))) return PX_ENOMEM;
    f->n_stamp++;
    return PX_OK;
}

int px_figure_page_per_panel(px_figure *f, int on)
{
    if (!f) return PX_EINVAL;
    f->page_per_panel = on != 0;
    return PX_OK;
}

int px_figure_hatch(px_figure *f, int panel, const double *x, const double *y, size_t n,
                    px_rgba color, double width, double spacing, double angle)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !x || !y || n < 3 || !valid_color(color) || !(width > 0 && width < 50) ||
        !(spacing >= 1 && spacing <= 500) || !isfinite(angle))
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    int st = copy_points(it, x, y, n);
    if (st != PX_OK) return st;
    it->kind = PX_ITEM_HATCH;
    it->color = color;
    it->width = width;
    it->spacing = spacing;
    it->angle = angle;
    p->n_items++;
    return PX_OK;
}

int px_figure_legend_patch(px_figure *f, int panel, const char *text, px_rgba fill,
                           px_rgba stroke, double hatch, double angle)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !text || !valid_color(fill) || !valid_color(stroke) || !(hatch >= 0 && hatch < 100) ||
        !isfinite(angle))
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    if (!(it->text = dupstr(text))) return PX_ENOMEM;
    it->kind = PX_ITEM_PATCH;
    it->fill = fill;
    it->color = stroke;
    it->width = 0.6;
    it->spacing = hatch;
    it->angle = angle;
    p->n_items++;
    return PX_OK;
}

int px_figure_legend_place(px_figure *f, int panel, px_legend_place where)
{
    px_panel *p = panel_of(f, panel);
    if (!p || where < PX_LEGEND_TOP_RIGHT || where > PX_LEGEND_OUTSIDE) return PX_EINVAL;
    p->legend = where;
    return PX_OK;
}

#define PX_SCALE_MIN 0.3 /* sensible bounds of the text and line scales */
#define PX_SCALE_MAX 4.0

int px_figure_scale(px_figure *f, double text, double line)
{
    if (!f || !(text >= PX_SCALE_MIN && text <= PX_SCALE_MAX) ||
        !(line >= PX_SCALE_MIN && line <= PX_SCALE_MAX))
        return PX_EINVAL;
    f->ts = text;
    f->ls = line;
    return PX_OK;
}

int px_figure_panels_used(px_figure *f, int n)
{
    if (!f || n < 1 || n > f->rows * f->cols) return PX_EINVAL;
    f->used = n;
    return PX_OK;
}

int px_figure_line_label(px_figure *f, int panel, const double *x, const double *y, size_t n,
                         const char *text, const char *alt, int chem, double size, px_rgba color,
                         double at)
{
    px_panel *p = panel_of(f, panel);
    if (!p || !x || !y || n < 2 || !text || !(size > 0 && size < 200) || !valid_color(color) ||
        !(at >= 0 && at <= 1))
        return PX_EINVAL;
    px_item *it = new_item(p);
    if (!it) return PX_ENOMEM;
    int st = copy_points(it, x, y, n);
    if (st != PX_OK) return st;
    if (!(it->text = dupstr(text)) || (alt && !(it->alt = dupstr(alt)))) {
        free_item(it);
        return PX_ENOMEM;
    }
    it->kind = PX_ITEM_LINE_LABEL;
    it->chem = chem != 0;
    it->width = size;
    it->color = color;
    it->at = at;
    p->n_items++;
    return PX_OK;
}


int px_figure_meta(px_figure *f, const char *key, const char *text)
{
    if (!f || !key || !text) return PX_EINVAL;
    size_t kl = strlen(key);
    if (kl < 1 || kl > PX_PNG_KEY_MAX || key[0] == ' ' || key[kl - 1] == ' ') return PX_EINVAL;
    for (size_t i = 0; i < kl; i++)
        if (key[i] < 0x20 || key[i] > 0x7e) return PX_EINVAL;
    char *v = dupstr(text);
    if (!v) return PX_ENOMEM;
    for (size_t k = 0; k < f->n_meta; k++)
        if (strcmp(f->meta_key[k], key) == 0) {
            px_free(NULL, f->meta_val[k]);
            f->meta_val[k] = v;
            return PX_OK;
        }
    char *kd = dupstr(key);
    char **nk = px_realloc(NULL, f->meta_key, f->n_meta * sizeof *nk, (f->n_meta + 1) * sizeof *nk);
    if (nk) f->meta_key = nk;
    char **nv = nk ? px_realloc(NULL, f->meta_val, f->n_meta * sizeof *nv, (f->n_meta + 1) * sizeof *nv) : NULL;
    if (nv) f->meta_val = nv;
    if (!kd || !nk || !nv) {
        px_free(NULL, kd);
        px_free(NULL, v);
        return PX_ENOMEM;
    }
    f->meta_key[f->n_meta] = kd;
    f->meta_val[f->n_meta] = v;
    f->n_meta++;
    return PX_OK;
}

int px_figure_bare(px_figure *f, int panel, int on)
{
    px_panel *p = panel_of(f, panel);
    if (!p) return PX_EINVAL;
    p->bare = on != 0;
    return PX_OK;
}

int px_figure_stamp_below(px_figure *f, int on)
{
    if (!f) return PX_EINVAL;
    f->stamp_below = on != 0;
    return PX_OK;
}

int px_figure_reference_output(px_figure *f, int on)
{
    if (!f) return PX_EINVAL;
    f->reference_output = on != 0;
    return PX_OK;
}

int px_figure_svg_text(px_figure *f, px_svg_text mode)
{
    if (!f || (mode != PX_SVG_TEXT_TEXT && mode != PX_SVG_TEXT_OUTLINE)) return PX_EINVAL;
    f->svg_text = mode;
    return PX_OK;
}
