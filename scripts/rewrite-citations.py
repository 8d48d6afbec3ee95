#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Rewrites citations of the old out-of-repository notes into citations of the
repository's docs, and lists every cited section the docs do not have.

    methods.md, "X"        -> docs/methods.md, "X"
    interfaces.md, "X"     -> docs/file-formats.md, "Y"   (Y: the matching section)
    check-values.md 1a     -> docs/methods.md, "Check values" 1a
    design.md              -> docs/architecture.md

Only *.h, *.cpp, *.sh, *.md and *.html files under core/ cli/ ui/ report/ app/
tests/ tools/ fuzz/ resources/ are touched; comments and strings alike.
Without --write nothing is changed: the script prints what it would do.
Exit status: 0 when every cited section exists, 1 otherwise.

Usage: scripts/rewrite-citations.py [--write] [--verbose] [--root DIR]
"""

import argparse
import os
import re
import sys

FOLDERS = ["core", "cli", "ui", "report", "app", "tests", "tools", "fuzz", "resources"]
SUFFIXES = (".h", ".cpp", ".sh", ".md", ".html")

# Old note -> the repository document that replaces it.
TARGETS = {
    "methods.md": "docs/methods.md",
    "interfaces.md": "docs/file-formats.md",
    "design.md": "docs/architecture.md",
}

# Section names the old notes used that are spelled differently in the new docs.
ALIASES = {
    "docs/methods.md": {
        "at date d": "Elo rating",
        "i&si": "I&SI order",
        "which encounters": "Which encounters, which animals, in which order",
        "steepness test": "Steepness",
        "randomisation": "Randomisations",
    },
    "docs/file-formats.md": {
        "animals": "animals.csv",
        "residences": "residences.csv",
        "encounters": "encounters.csv",
        "import files": "Import files",
        "command line": "Command line",
    },
    "docs/architecture.md": {},
}

# An old note's name, not already inside a docs/ path; /work/shared/ or shared/ may precede it.
NOTE = re.compile(r"(?<![\w./-])((?:/work/)?(?:shared/)?)(methods|interfaces|design)\.md\b")
DOCS_CITATION = re.compile(r"(?<![\w.-])docs/[a-z-]+\.md\b")
CHECK_VALUES = re.compile(
    r"(?<![\w./-])(?:(?:/work/)?shared/)?check-values(?:\.md)?"
    r"(?P<tail>(?:,?[ \t]+(?:section[ \t]+)?(?P<num>\d{1,2}[a-z]?)\b)?)")
# A quoted section right after the note's name: `, "X"`, ` "X"`, ` ("X"`. A line
# break with a comment leader (///, //, *, #) may come before or inside the quote.
SECTION = re.compile(r'(?P<lead>,?(?:[ \t]*\n[ \t]*(?:///|//|\*|#))?[ \t]*\(?[ \t]*)"(?P<name>[^"\n]{1,80}(?:\n[ \t]*(?:///|//|\*|#)?[ \t]*[^"\n]{1,80})?)"')
LEADER = re.compile(r"\s*\n\s*(?:///|//|\*|#)?\s*")


def normalise(name):
    """Lower-case section name without backticks and without a trailing (...)."""
    name = LEADER.sub(" ", name).replace("`", "").strip()
    name = re.sub(r"\s*\([^()]*\)\s*$", "", name)
    return name.lower()


def read_headings(path):
    """Normalised heading -> heading text; and the numbers of the check-value subsections."""
    headings, numbers = {}, set()
    in_check_values = False
    with open(path, encoding="utf-8", newline="") as f:
        for line in f:
            m = re.match(r"^(#{1,6})\s+(.*?)\s*$", line)
            if not m:
                continue
            level, text = len(m.group(1)), m.group(2)
            headings.setdefault(normalise(text), text)
            if level == 2:
                in_check_values = normalise(text) == "check values"
            elif in_check_values:
                n = re.match(r"^(\d+)\.", text)
                if n:
                    numbers.add(int(n.group(1)))
    return headings, numbers


class Rewriter:
    def __init__(self, root):
        self.root = root
        self.headings = {}
        self.check_numbers = set()
        for doc in set(TARGETS.values()):
            path = os.path.join(root, doc)
            if os.path.exists(path):
                h, numbers = read_headings(path)
                self.headings[doc] = h
                if doc == "docs/methods.md":
                    self.check_numbers = numbers
            else:
                self.headings[doc] = None
        self.rewritten = 0
        self.unresolved = []  # (file, line, citation, reason)
        self.changes = []  # (file, line, old, new)

    def resolve(self, doc, name):
        """The heading a cited section stands for, or None."""
        if doc not in self.headings:
            path = os.path.join(self.root, doc)
            self.headings[doc] = read_headings(path)[0] if os.path.exists(path) else None
        heads = self.headings.get(doc)
        if heads is None:
            return None
        key = normalise(name)
        if key in heads:
            return heads[key]
        alias = ALIASES.get(doc, {}).get(key)
        if alias and normalise(alias) in heads:
            return heads[normalise(alias)]
        return None

    def rewrite_text(self, rel, text):
        out, pos = [], 0
        for m in self.matches(text):
            start, end, new, problem = m
            out.append(text[pos:start])
            out.append(new)
            pos = end
            line = text.count("\n", 0, start) + 1
            old = text[start:end]
            if new != old:
                self.rewritten += 1
                self.changes.append((rel, line, old, new))
            if problem:
                self.unresolved.append((rel, line, old.replace("\n", " "), problem))
        out.append(text[pos:])
        return "".join(out)

    def matches(self, text):
        """(start, end, replacement, problem) for every citation, in text order."""
        found = []
        for m in NOTE.finditer(text):
            doc = TARGETS[m.group(2) + ".md"]
            start, end = m.start(), m.end()
            new = doc
            problem = None
            s = SECTION.match(text, end)
            if s:
                name = s.group("name")
                heading = self.resolve(doc, name)
                if heading is None:
                    problem = f'no section "{LEADER.sub(" ", name)}" in {doc}'
                    new += s.group(0)
                elif normalise(heading) == normalise(name):
                    new += s.group(0)  # the same section: keep the text (and its line breaks)
                else:
                    new += s.group("lead") + '"' + heading + '"'
                end = s.end()
            found.append((start, end, new, problem))
        for m in CHECK_VALUES.finditer(text):
            num = m.group("num")
            problem = None
            if "Check values" != self.resolve("docs/methods.md", "Check values"):
                problem = 'no section "Check values" in docs/methods.md'
            new = 'docs/methods.md, "Check values"'
            if num:
                new += " " + num
                if int(re.match(r"\d+", num).group(0)) not in self.check_numbers:
                    problem = f'no check value {num} in docs/methods.md, "Check values"'
            found.append((m.start(), m.end(), new, problem))
        for m in DOCS_CITATION.finditer(text):
            # Already a citation of the repository's docs: only check its section.
            doc = m.group(0)
            s = SECTION.match(text, m.end())
            if s and self.resolve(doc, s.group("name")) is None:
                problem = f'no section "{LEADER.sub(" ", s.group("name"))}" in {doc}'
                found.append((m.start(), s.end(), text[m.start():s.end()], problem))
        found.sort()
        return found

    def run(self, write, verbose):
        files = 0
        for folder in FOLDERS:
            base = os.path.join(self.root, folder)
            for dirpath, dirnames, filenames in os.walk(base):
                dirnames.sort()
                for name in sorted(filenames):
                    if not name.endswith(SUFFIXES):
                        continue
                    path = os.path.join(dirpath, name)
                    rel = os.path.relpath(path, self.root)
                    with open(path, encoding="utf-8", newline="") as f:
                        text = f.read()
                    new = self.rewrite_text(rel, text)
                    if new != text:
                        files += 1
                        if write:
                            with open(path, "w", encoding="utf-8", newline="") as f:
                                f.write(new)
        for rel, line, old, new in self.changes if verbose else []:
            print(f"{rel}:{line}: {old!r} -> {new!r}")
        for rel, line, cite, problem in self.unresolved:
            print(f"{rel}:{line}: {cite}: {problem}")
        for doc, heads in self.headings.items():
            if heads is None:
                print(f"{doc}: missing, so none of its sections can be found")
        mode = "rewrote" if write else "would rewrite"
        print(f"{mode} {self.rewritten} citations in {files} files; "
              f"{len(self.unresolved)} cite a section the docs do not have", file=sys.stderr)
        return 1 if self.unresolved else 0


def main():
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--write", action="store_true", help="change the files (default: only print)")
    parser.add_argument("--verbose", action="store_true", help="print every rewrite")
    parser.add_argument("--root", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), ".."),
                        help="the repository (default: this script's)")
    args = parser.parse_args()
    return Rewriter(os.path.abspath(args.root)).run(args.write, args.verbose)


if __name__ == "__main__":
    sys.exit(main())
