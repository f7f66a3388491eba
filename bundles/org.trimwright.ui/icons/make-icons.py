#!/usr/bin/env python3
"""Draws Trimwright's icons as small PNGs (our own simple pixel drawings; no external images).

Run from this folder: python3 make-icons.py. Uses only the Python standard library (zlib, struct)."""
import struct
import zlib

INK = (38, 50, 56, 255)        # dark slate
TEAL = (0, 121, 107, 255)
COPPER = (200, 110, 40, 255)
PALE = (224, 242, 241, 255)
RED = (198, 40, 40, 255)
AMBER = (230, 160, 0, 255)
WHITE = (255, 255, 255, 255)
GREY = (140, 150, 155, 255)


class Canvas:
    def __init__(self, size):
        self.n = size
        self.px = [[(0, 0, 0, 0)] * size for _ in range(size)]

    def rect(self, x0, y0, x1, y1, c):
        for y in range(max(0, y0), min(self.n, y1 + 1)):
            for x in range(max(0, x0), min(self.n, x1 + 1)):
                self.px[y][x] = c

    def frame(self, x0, y0, x1, y1, c):
        self.rect(x0, y0, x1, y0, c)
        self.rect(x0, y1, x1, y1, c)
        self.rect(x0, y0, x0, y1, c)
        self.rect(x1, y0, x1, y1, c)

    def line(self, x0, y0, x1, y1, c):
        steps = max(abs(x1 - x0), abs(y1 - y0), 1)
        for i in range(steps + 1):
            self.rect(round(x0 + (x1 - x0) * i / steps), round(y0 + (y1 - y0) * i / steps),
                      round(x0 + (x1 - x0) * i / steps), round(y0 + (y1 - y0) * i / steps), c)

    def save(self, name):
        raw = b"".join(b"\x00" + b"".join(bytes(p) for p in row) for row in self.px)
        def chunk(t, d):
            return struct.pack(">I", len(d)) + t + d + struct.pack(">I", zlib.crc32(t + d) & 0xFFFFFFFF)
        png = b"\x89PNG\r\n\x1a\n" + chunk(b"IHDR", struct.pack(">IIBBBBB", self.n, self.n, 8, 6, 0, 0, 0))
        png += chunk(b"IDAT", zlib.compress(raw, 9)) + chunk(b"IEND", b"")
        with open(name, "wb") as f:
            f.write(png)


def app_icon(n):
    """A staircase of trim steps rising to a copper target line, on a slate tile."""
    c = Canvas(n)
    r = max(1, n // 16)
    c.rect(0, 0, n - 1, n - 1, INK)
    for corner in ((0, 0), (n - r, 0), (0, n - r), (n - r, n - r)):
        c.rect(corner[0], corner[1], corner[0] + r - 1, corner[1] + r - 1, (0, 0, 0, 0))
    steps = 5
    w = (n - 4 * r) // steps
    for i in range(steps):
        h = (i + 1) * (n - 6 * r) // (steps + 1)
        c.rect(2 * r + i * w, n - 2 * r - h, 2 * r + (i + 1) * w - max(1, r // 2) - 1, n - 2 * r - 1, TEAL)
    y = n - 2 * r - 4 * (n - 6 * r) // (steps + 1) - 1
    c.rect(r, y, n - r - 1, y + max(0, r // 2), COPPER)
    return c


def block():
    c = Canvas(16)
    c.rect(2, 2, 13, 13, PALE)
    c.frame(2, 2, 13, 13, INK)
    c.rect(5, 5, 10, 10, TEAL)
    return c


def register():
    c = Canvas(16)
    c.rect(1, 5, 14, 10, PALE)
    c.frame(1, 5, 14, 10, INK)
    for x in (4, 7, 10):
        c.rect(x + 1, 5, x + 1, 10, INK)
    return c


def field():
    c = Canvas(16)
    c.frame(1, 5, 14, 10, GREY)
    c.rect(5, 5, 10, 10, TEAL)
    c.frame(5, 5, 10, 10, INK)
    return c


def spec_file():
    c = Canvas(16)
    c.rect(3, 1, 12, 14, WHITE)
    c.frame(3, 1, 12, 14, INK)
    for i in range(4):
        c.rect(5 + 2 * i, 11 - 2 * i, 6 + 2 * i, 12, TEAL)
    return c


def project():
    c = Canvas(16)
    c.rect(1, 4, 14, 13, (255, 224, 178, 255))
    c.frame(1, 4, 14, 13, INK)
    c.rect(1, 2, 6, 4, (255, 224, 178, 255))
    c.frame(1, 2, 6, 4, INK)
    return c


def new_spec():
    c = spec_file()
    c.rect(10, 0, 15, 5, (0, 0, 0, 0))
    c.rect(12, 0, 12, 5, COPPER)
    c.rect(10, 2, 15, 2, COPPER)
    return c


def save():
    c = Canvas(16)
    c.rect(2, 2, 13, 13, TEAL)
    c.frame(2, 2, 13, 13, INK)
    c.rect(5, 2, 10, 6, WHITE)
    c.rect(4, 9, 11, 13, PALE)
    return c


def arrow(left):
    c = Canvas(16)
    pts = [(12, 11), (12, 7), (11, 6), (4, 6)]
    for (x0, y0), (x1, y1) in zip(pts, pts[1:]):
        c.line(x0, y0, x1, y1, TEAL)
        c.line(x0, y0 + 1, x1, y1 + 1, TEAL)
    c.line(4, 6, 7, 3, TEAL)
    c.line(4, 7, 7, 10, TEAL)
    if not left:
        c.px = [list(reversed(row)) for row in c.px]
    return c


def prefs():
    c = Canvas(16)
    for i, x in enumerate((3, 8, 13)):
        c.rect(x, 2, x, 13, GREY)
        k = (9, 4, 7)[i]
        c.rect(x - 2, k, x + 2, k + 2, COPPER)
    return c


def marker(color, bang):
    c = Canvas(16)
    for y in range(3, 14):
        for x in range(2, 14):
            if (x - 7.5) ** 2 + (y - 8) ** 2 <= 30:
                c.px[y][x] = color
    c.rect(7, 5, 8, 9, WHITE)
    c.rect(7, 11, 8, 12, WHITE)
    return c


def chart():
    c = Canvas(16)
    c.rect(1, 1, 1, 14, INK)
    c.rect(1, 14, 14, 14, INK)
    c.line(2, 12, 6, 8, TEAL)
    c.line(6, 8, 9, 9, TEAL)
    c.line(9, 9, 14, 3, TEAL)
    return c


def export():
    """A spec page with a copper arrow leaving it to the right (the spec going out to other teams)."""
    c = Canvas(16)
    c.rect(1, 1, 9, 14, WHITE)
    c.frame(1, 1, 9, 14, INK)
    for i in range(3):
        c.rect(3 + 2 * i, 10 - 2 * i, 4 + 2 * i, 12, TEAL)
    c.rect(7, 7, 12, 8, COPPER)
    c.line(11, 4, 14, 7, COPPER)
    c.line(11, 11, 14, 8, COPPER)
    c.line(10, 4, 13, 7, COPPER)
    c.line(10, 11, 13, 8, COPPER)
    return c


if __name__ == "__main__":
    for n in (16, 32, 64, 128):
        app_icon(n).save("trimwright%d.png" % n)
    block().save("block.png")
    register().save("register.png")
    field().save("field.png")
    spec_file().save("spec.png")
    project().save("project.png")
    new_spec().save("new.png")
    save().save("save.png")
    arrow(True).save("undo.png")
    arrow(False).save("redo.png")
    prefs().save("prefs.png")
    marker(RED, True).save("error.png")
    marker(AMBER, True).save("warning.png")
    chart().save("chart.png")
    export().save("export.png")
