"""pngdecode.py - a small PNG decoder for the reference tests (ISO/IEC
15948: chunks, zlib-compressed IDAT, filter types 0-4), independent of
cairo and of any browser."""
import struct
import zlib


def decode_png(data):
    """RGBA 8-bit PNG -> (width, height, rows of bytes); ISO/IEC 15948."""
    assert data[:8] == b"\x89PNG\r\n\x1a\n", "PNG signature"
    pos, idat, ihdr = 8, b"", None
    while pos < len(data):
        n, kind = struct.unpack(">I4s", data[pos:pos + 8])
        body = data[pos + 8:pos + 8 + n]
        if kind == b"IHDR":
            ihdr = struct.unpack(">IIBBBBB", body)
        elif kind == b"IDAT":
            idat += body
        pos += 12 + n
    w, h, depth, ctype, _, _, interlace = ihdr
    assert depth == 8 and ctype in (2, 6) and interlace == 0, "8-bit RGB(A), not interlaced"
    bpp = 4 if ctype == 6 else 3
    raw = zlib.decompress(idat)
    stride = w * bpp
    rows, prev, i = [], bytearray(stride), 0
    for _ in range(h):
        ftype, line = raw[i], bytearray(raw[i + 1:i + 1 + stride])
        i += 1 + stride
        for k in range(stride):
            a = line[k - bpp] if k >= bpp else 0
            b = prev[k]
            c = prev[k - bpp] if k >= bpp else 0
            if ftype == 1:
                line[k] = (line[k] + a) & 255
            elif ftype == 2:
                line[k] = (line[k] + b) & 255
            elif ftype == 3:
                line[k] = (line[k] + (a + b) // 2) & 255
            elif ftype == 4:
                p = a + b - c
                pa, pb, pc = abs(p - a), abs(p - b), abs(p - c)
                pr = a if pa <= pb and pa <= pc else (b if pb <= pc else c)
                line[k] = (line[k] + pr) & 255
        rows.append(bytes(line))
        prev = line
    return w, h, bpp, rows
