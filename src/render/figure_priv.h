/* figure_priv.h - private: the figure model shared by figure.c (building)
 * and the layout and drawing files (layout.h lists them). */
#ifndef PX_FIGURE_PRIV_H
#define PX_FIGURE_PRIV_H
#include "render/render.h"

typedef enum {
    PX_ITEM_POLYGON,
    PX_ITEM_LINE,
    PX_ITEM_TEXT,
    PX_ITEM_HATCH,
    PX_ITEM_PATCH,
    PX_ITEM_LINE_LABEL
} px_item_kind;

typedef struct px_item {
    px_item_kind kind;
    double *x, *y;
    size_t n;
    px_rgba fill, color;
    double width; /* stroke width, or font size for text */
    px_dash dash;
    char *text;     /* polygon label, line legend, or the text */
    char *alt;      /* line label: a shorter text to try, or NULL */
    double lx, ly;  /* label anchor (polygon) or position (text), data units */
    int chem;
    double spacing, angle; /* hatch: line spacing (points) and angle (degrees); patch: hatch */
    double at;             /* line label: preferred fraction of the line's length */
} px_item;

typedef struct px_panel {
    double x0, x1, y0, y1;
    int xlog, ylog;
    px_legend_place legend;
    int bare; /* no frame, ticks or titles */
    char *xlabel, *ylabel, *title;
    px_item *items;
    size_t n_items, cap;
} px_panel;

struct px_figure {
    double width, height;
    int rows, cols;
    px_panel *panels;
    char **stamp;
    size_t n_stamp;
    int page_per_panel;
    int used;              /* panels drawn: the first `used` */
    int stamp_below;       /* the stamp adds to the height instead of taking from it */
    double ts, ls;         /* text and line scale */
    char **meta_key, **meta_val;
    size_t n_meta;
    int reference_output;  /* cairo's PNG writer and the former SVG rounding */
    px_svg_text svg_text;  /* SVG text as <text> (default) or as glyph outlines */
};


#endif
