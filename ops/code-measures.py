#!/usr/bin/env python3
"""Size measures of the main code (issue: largest main file under 250 lines, no method over 50):
the largest files by line count and the longest methods, counted from a method's declaration line to its closing
brace by brace depth (comments and strings are not parsed, which is good enough for this code base's style); and the
pages' JavaScript files (src/main/resources/META-INF/resources/app) by line count, held to the same 250 lines.
Run from the repository root: python3 ops/code-measures.py (exits 1 when a file is over 250 lines or a method over 50)"""
import os
import re
import sys

ROOT = os.path.join("src", "main", "java")
PAGES = os.path.join("src", "main", "resources", "META-INF", "resources", "app")
LIMIT_LINES, LIMIT_METHOD = 250, 50
DECLARATION = re.compile(r"^\s+(public |protected |private |static |final |synchronized |abstract |default )*"
                         r"[\w<>\[\], .?]+\s+(\w+)\s*\([^;]*$")
KEYWORDS = {"if", "for", "while", "switch", "catch", "return", "new", "else", "try", "do"}

files, methods = [], []
for folder, _, names in os.walk(ROOT):
    for name in names:
        if not name.endswith(".java"):
            continue
        path = os.path.join(folder, name)
        lines = open(path, encoding="utf-8").read().splitlines()
        files.append((len(lines), path))
        i = 0
        while i < len(lines):
            match = DECLARATION.match(lines[i])
            if match and match.group(2) not in KEYWORDS and "=" not in lines[i].split("(")[0]:
                depth, j, opened = 0, i, False
                while j < len(lines):
                    depth += lines[j].count("{") - lines[j].count("}")
                    opened = opened or "{" in lines[j]
                    if opened and depth <= 0:
                        break
                    if not opened and lines[j].rstrip().endswith(";"):
                        break
                    j += 1
                if opened:
                    methods.append((j - i + 1, path, match.group(2)))
                i = j + 1 if opened else i + 1
            else:
                i += 1

scripts = []
for folder, _, names in os.walk(PAGES):
    for name in names:
        if name.endswith(".js"):
            path = os.path.join(folder, name)
            scripts.append((len(open(path, encoding="utf-8").read().splitlines()), path))


def largest(label, rows):
    """Prints the count over the limit, then the largest eight and any further over the limit."""
    rows.sort(reverse=True)
    over = sum(1 for n, _ in rows if n > LIMIT_LINES)
    print("%s: %d; over %d lines: %d" % (label, len(rows), LIMIT_LINES, over))
    for n, path in rows[:max(8, over)]:
        print("  %4d  %s" % (n, path))
    return over


methods.sort(reverse=True)
over = largest("main files", files)
long_methods = sum(1 for n, _, _ in methods if n > LIMIT_METHOD)
print("methods over %d lines: %d" % (LIMIT_METHOD, long_methods))
for n, path, name in methods[:max(8, long_methods)]:
    print("  %4d  %s  %s" % (n, path, name))
over += largest("page scripts", scripts)
sys.exit(1 if over or long_methods else 0)
