/* svgpass.c - the passes over cairo's SVG bytes that make the output
 * reproducible and small: surface ids renumbered by first appearance (cairo
 * counts them per process), coordinates rounded to PX_SVG_DECIMALS (two
 * implementations, text and strtod, giving the same bytes; the second is
 * the reference), and the figure's words inserted as <title>, <desc> and
 * <metadata>.  Each pass reads the buffer and hands a rewritten copy over
 * with px_mem_replace; PX_OK, PX_ENOMEM, PX_ELIMIT or PX_EIO, the buffer
 * unchanged on failure.  Contract in backend.h. */
#include "core/alloc.h"
#include "core/status.h"
#include "render/backend.h"
#include "render/text.h"
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#define PX_SVG_MAX_SURFACES 256
int px_svg_renumber(px_membuf *m)
{
    static const char key[] = "surface";
    const size_t klen = sizeof key - 1;
    unsigned long seen[PX_SVG_MAX_SURFACES];
    size_t nseen = 0;
    size_t cap = m->n + 1;
    unsigned char *out = px_alloc(NULL, cap);
    if (!out) return PX_ENOMEM;
    size_t o = 0;
    for (size_t i = 0; i < m->n;) {
        if (m->data[i] == 's' && i + klen < m->n && memcmp(m->data + i, key, klen) == 0 &&
            m->data[i + klen] >= '0' && m->data[i + klen] <= '9') {
            size_t j = i + klen;
            unsigned long v = 0;
            while (j < m->n && m->data[j] >= '0' && m->data[j] <= '9' && v < 100000000UL)
                v = v * 10 + (unsigned long)(m->data[j++] - '0');
            size_t k = 0;
            while (k < nseen && seen[k] != v) k++;
            if (k == nseen) {
                if (nseen == PX_SVG_MAX_SURFACES) {
                    px_free(NULL, out);
                    return PX_ELIMIT;
                }
                seen[nseen++] = v;
            }
            char num[32];
            int len = snprintf(num, sizeof num, "%zu", k + 1);
            size_t need = o + klen + (size_t)len + (m->n - j) + 1;
            if (need > cap) { /* renumbering never lengthens much; grow if it does */
                unsigned char *g = px_realloc(NULL, out, cap, need + 64);
                if (!g) {
                    px_free(NULL, out);
                    return PX_ENOMEM;
                }
                out = g;
                cap = need + 64;
            }
            memcpy(out + o, key, klen);
            memcpy(out + o + klen, num, (size_t)len);
            o += klen + (size_t)len;
            i = j;
        } else { /* copy up to the next 's' in one go */
            const unsigned char *nx = memchr(m->data + i + 1, 's', m->n - i - 1);
            size_t stop = nx ? (size_t)(nx - m->data) : m->n;
            memcpy(out + o, m->data + i, stop - i);
            o += stop - i;
            i = stop;
        }
    }
    return px_mem_replace(m, out, o);
}

/* cairo writes SVG coordinates with up to six decimals ("1.671875"); a
 * thousandth of a point (0.35 um) is far below what any screen or printer
 * shows, so numbers with more decimals are rounded to three and their
 * trailing zeros dropped.  Run on cairo's output only, before the <title>
 * and <desc> are inserted, so no text is touched.  Two implementations of
 * the same rounding: svg_round_text rounds the digits as text (the output
 * path), svg_round_strtod by strtod and printf (the former path, kept as
 * the reference the benchmark and tests compare with); both give the same
 * bytes. */
#define PX_SVG_DECIMALS 3

/* Round the decimal number s[0..len) (digits, '.', digits; more than
 * PX_SVG_DECIMALS decimals) into txt; returns its length, or -1 on an exact
 * tie (...5000), where the binary value decides the rounding as printf does. */
static int svg_round_text(const unsigned char *s, size_t len, char *txt, size_t cap)
{
    size_t dot = 0;
    while (dot < len && s[dot] != '.') dot++;
    size_t keep = dot + 1 + PX_SVG_DECIMALS; /* digits kept, with the dot */
    if (dot >= len || keep >= len || keep + 2 > cap) return -1;
    int up = s[keep] > '5';
    if (s[keep] == '5') {
        size_t k = keep + 1;
        while (k < len && s[k] == '0') k++;
        if (k == len) return -1;
        up = 1;
    }
    memcpy(txt, s, keep);
    size_t w = keep;
    if (up) { /* carry from the last kept digit leftwards, over the dot */
        size_t k = keep;
        int carry = 1;
        while (carry && k-- > 0) {
            if (txt[k] == '.') continue;
            if (txt[k] == '9') txt[k] = '0';
            else txt[k]++, carry = 0;
        }
        if (carry) { /* 999.9996 -> 1000.000 */
            memmove(txt + 1, txt, w);
            txt[0] = '1';
            w++;
        }
    }
    while (w > 0 && txt[w - 1] == '0') w--;
    if (w > 0 && txt[w - 1] == '.') w--;
    return (int)w;
}

static int svg_round_strtod(const unsigned char *s, size_t len, char *txt, size_t cap)
{
    char num[64];
    if (len > sizeof num - 1) len = sizeof num - 1;
    memcpy(num, s, len);
    num[len] = '\0';
    int w = snprintf(txt, cap, "%.*f", PX_SVG_DECIMALS, strtod(num, NULL));
    while (w > 0 && txt[w - 1] == '0') w--;
    if (w > 0 && txt[w - 1] == '.') w--;
    return w;
}

static int is_digit(unsigned char c) { return c >= '0' && c <= '9'; }
static int is_alpha(unsigned char c) { return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z'); }

int px_svg_compact(px_membuf *m, int reference)
{
    unsigned char *out = px_alloc(NULL, m->n + 1);
    if (!out) return PX_ENOMEM;
    size_t o = 0;
    for (size_t i = 0; i < m->n;) {
        unsigned char c = m->data[i];
        int starts = is_digit(c) &&
                     (i == 0 || !(is_digit(m->data[i - 1]) || is_alpha(m->data[i - 1]) ||
                                  m->data[i - 1] == '.' || m->data[i - 1] == '_' || m->data[i - 1] == '#'));
        if (!starts) {
            out[o++] = m->data[i++];
            continue;
        }
        size_t j = i;
        while (j < m->n && is_digit(m->data[j])) j++;
        size_t dot = j, k = j;
        if (k < m->n && m->data[k] == '.') {
            k++;
            while (k < m->n && is_digit(m->data[k])) k++;
        }
        int is_name = k < m->n && is_alpha(m->data[k]);
        if (k - dot - 1 <= PX_SVG_DECIMALS || dot == k || is_name) { /* short, integer or part of a name */
            memcpy(out + o, m->data + i, k - i);
            o += k - i;
            i = k;
            continue;
        }
        char txt[64];
        int w = -1;
        if (!reference && k - i < sizeof txt - 2) w = svg_round_text(m->data + i, k - i, txt, sizeof txt);
        if (w < 0) w = svg_round_strtod(m->data + i, k - i, txt, sizeof txt);
        int neg = i > 0 && m->data[i - 1] == '-';
        if (neg && w == 1 && txt[0] == '0') o--; /* "-0.0001" -> "0", not "-0" */
        memcpy(out + o, txt, (size_t)w); /* never longer than the input */
        o += (size_t)w;
        i = k;
    }
    return px_mem_replace(m, out, o);
}

/* The figure's words for SVG, whole and in phlox notation (with glyph
 * outlines the file's only words) for a search, a screen reader or a test.  One
 * <title> (the first panel title) and one <desc> with a line per panel
 * title, axis title, field label (phlox notation), legend entry, text and
 * stamp line, XML-escaped, inserted after the root element's start tag. */
typedef px_strbuf sbuf;

static void sb_put(sbuf *b, const char *s, size_t k) { px_strbuf_put(b, s, k); }

static void sb_str(sbuf *b, const char *s) { sb_put(b, s, strlen(s)); }

/* XML-escaped text; the braces of formula markup are dropped unless `raw`
 * (metadata holds the text as given). */
static void sb_xml_text(sbuf *b, const char *s, int raw)
{
    for (; *s; s++) {
        switch (*s) {
        case '&': sb_str(b, "&amp;"); break;
        case '<': sb_str(b, "&lt;"); break;
        case '>': sb_str(b, "&gt;"); break;
        case '"': sb_str(b, "&quot;"); break;
        case '{': case '}':
            if (raw) sb_put(b, s, 1);
            break;
        default:
            if ((unsigned char)*s >= 0x20 || *s == '\n' || *s == '\t') sb_put(b, s, 1);
        }
    }
}

static void sb_xml(sbuf *b, const char *s) { sb_xml_text(b, s, 0); }
static void sb_xml_raw(sbuf *b, const char *s) { sb_xml_text(b, s, 1); }

static void sb_line(sbuf *b, const char *what, const char *text)
{
    sb_str(b, what);
    sb_str(b, ": ");
    sb_xml(b, text);
    sb_str(b, "\n");
}

int px_svg_describe(px_membuf *m, const px_figure *f)
{
    sbuf b = {0};
    const char *title = NULL;
    for (int i = 0; i < f->used && !title; i++) title = f->panels[i].title;
    sb_str(&b, "\n<title>");
    sb_xml(&b, title ? title : "phlox figure");
    sb_str(&b, "</title>\n<desc>\n");
    for (int i = 0; i < f->used; i++) {
        const px_panel *p = &f->panels[i];
        char head[32];
        snprintf(head, sizeof head, "panel %d", i + 1);
        sb_line(&b, head, p->title ? p->title : "");
        if (p->xlabel) sb_line(&b, "x axis", p->xlabel);
        if (p->ylabel) sb_line(&b, "y axis", p->ylabel);
        for (size_t k = 0; k < p->n_items; k++) {
            const px_item *it = &p->items[k];
            if (!it->text) continue;
            sb_line(&b, it->kind == PX_ITEM_POLYGON ? "field" : it->kind == PX_ITEM_TEXT ? "text" : "legend",
                    it->text);
        }
    }
    for (size_t k = 0; k < f->n_stamp; k++) sb_line(&b, "stamp", f->stamp[k]);
    sb_str(&b, "</desc>");
    if (f->n_meta) { /* the file's metadata: the full provenance, whatever the stamp shows */
        sb_str(&b, "\n<metadata id=\"phlox\">\n");
        for (size_t k = 0; k < f->n_meta; k++) {
            sb_str(&b, "<phlox:entry xmlns:phlox=\"urn:phlox:figure\" key=\"");
            sb_xml_raw(&b, f->meta_key[k]);
            sb_str(&b, "\">");
            sb_xml_raw(&b, f->meta_val[k]);
            sb_str(&b, "</phlox:entry>\n");
        }
        sb_str(&b, "</metadata>");
    }
    if (b.failed) {
        px_free(NULL, b.s);
        return PX_ENOMEM;
    }
    /* after the '>' that closes "<svg ...": attribute values hold no '>' */
    unsigned char *root = NULL;
    for (size_t i = 0; i + 4 < m->n; i++)
        if (memcmp(m->data + i, "<svg", 4) == 0) {
            root = m->data + i;
            break;
        }
    unsigned char *gt = root ? memchr(root, '>', m->n - (size_t)(root - m->data)) : NULL;
    if (!gt) {
        px_free(NULL, b.s);
        return PX_EIO;
    }
    size_t at = (size_t)(gt - m->data) + 1;
    unsigned char *out = px_alloc(NULL, m->n + b.n);
    if (!out) {
        px_free(NULL, b.s);
        return PX_ENOMEM;
    }
    memcpy(out, m->data, at);
    memcpy(out + at, b.s, b.n);
    memcpy(out + at + b.n, m->data + at, m->n - at);
    px_free(NULL, b.s);
    return px_mem_replace(m, out, m->n + b.n);
}
