#!/usr/bin/python3
"""Writes the fuzz corpus seeds: for every catalogue function, one input that
calls it with its own example arguments (tag 7 of fuzz_catalog.cpp) and one
with those arguments scaled a little (tag 8). Seeds pick the function by its
index in the catalogue, so after a reordering they still are valid inputs of
some function; rerun this script when functions are added.

    /usr/bin/python3 tests/fuzz/make_seeds.py build/addin/solarith-codegen
"""
import os
import struct
import subprocess
import sys

HERE = os.path.dirname(os.path.abspath(__file__))


def main():
    names = subprocess.run([sys.argv[1], "names"], capture_output=True, text=True, check=True).stdout
    corpus = os.path.join(HERE, "corpus")
    os.makedirs(corpus, exist_ok=True)
    for old in os.listdir(corpus):
        if old.startswith("seed-"):
            os.remove(os.path.join(corpus, old))
    for index, line in enumerate(names.splitlines()):
        name, _, count = line.split("\t")[:3]
        count = int(count)
        head = struct.pack("<HB", index, count)
        with open(os.path.join(corpus, "seed-%s-example" % name), "wb") as f:
            f.write(head + bytes([7]) * count)
        with open(os.path.join(corpus, "seed-%s-scaled" % name), "wb") as f:
            f.write(head + bytes([8, 0x10]) * count)
    print("wrote seeds for %d functions to %s" % (len(names.splitlines()), corpus))


if __name__ == "__main__":
    main()
