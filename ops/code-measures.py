#!/usr/bin/env python3
"""Size measures of the main code (issue: largest main file under 250 lines, no method over 50):
the largest files by line count and the longest methods, counted from a method's declaration line to its closing
brace by brace depth (comments and strings are not parsed, which is good enough for this code base's style).
Run from the repository root: python3 ops/code-measures.py"""
import os
import re

ROOT = os.path.join("src", "main", "java")
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

files.sort(reverse=True)
methods.sort(reverse=True)
print("main files: %d; over 250 lines: %d" % (len(files), sum(1 for n, _ in files if n > 250)))
for n, path in files[:8]:
    print("  %4d  %s" % (n, path))
print("methods over 50 lines: %d" % sum(1 for n, _, _ in methods if n > 50))
for n, path, name in methods[:8]:
    print("  %4d  %s  %s" % (n, path, name))
