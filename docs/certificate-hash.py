#!/usr/bin/env python3
"""Recomputes the SHA-256 of a chirocore certificate's content from the canonical text
specified in docs/certificate-format.md, independently of the Java code.

usage: python3 docs/certificate-hash.py CERT...
prints, per file: the recorded hash, the recomputed hash, and "ok" or "MISMATCH"; exit 1 on a mismatch.
"""
import hashlib
import json
import sys


class Number(str):
    """A JSON number kept exactly as written in the file."""


def quote(s):
    out = ['"']
    for ch in s:
        if ch == '"':
            out.append('\\"')
        elif ch == '\\':
            out.append('\\\\')
        elif ch in '\b\f\n\r\t':
            out.append({'\b': '\\b', '\f': '\\f', '\n': '\\n', '\r': '\\r', '\t': '\\t'}[ch])
        elif ord(ch) < 0x20:
            out.append('\\u%04x' % ord(ch))
        else:
            out.append(ch)
    out.append('"')
    return ''.join(out)


def canonical(value, level=0):
    pad = '  ' * level
    if isinstance(value, list) and isinstance(value, Members):
        if not value:
            return '{}'
        items = [pad + '  ' + quote(k) + ': ' + canonical(v, level + 1) for k, v in value]
        return '{\n' + ',\n'.join(items) + '\n' + pad + '}'
    if isinstance(value, list):
        if all(not isinstance(v, list) for v in value):
            return '[' + ', '.join(canonical(v, level + 1) for v in value) + ']'
        return '[\n' + ',\n'.join(pad + '  ' + canonical(v, level + 1) for v in value) + '\n' + pad + ']'
    if isinstance(value, Number):
        return str(value)
    if isinstance(value, str):
        return quote(value)
    if value is True:
        return 'true'
    if value is False:
        return 'false'
    return 'null'


class Members(list):
    """An object's members as (name, value) pairs in file order."""


def main(paths):
    bad = 0
    for path in paths:
        with open(path, 'rb') as f:
            doc = json.loads(f.read().decode('utf-8-sig'), object_pairs_hook=Members,
                             parse_int=Number, parse_float=Number, parse_constant=Number)
        top = dict(doc)
        actual = hashlib.sha256(canonical(top['content']).encode('utf-8')).hexdigest()
        ok = actual == top['sha256']
        bad += 0 if ok else 1
        print(path, top['sha256'], actual, 'ok' if ok else 'MISMATCH')
    return 1 if bad else 0


if __name__ == '__main__':
    sys.exit(main(sys.argv[1:]))
