#!/usr/bin/python3
"""The add-in runs inside the user's office: it must do no file, network or
process I/O of its own. Checks the dynamic symbols libsolarith.so imports."""
import os
import re
import subprocess
import unittest
import zipfile

# libc and libstdc++ entry points for files, sockets, processes, dynamic
# loading and console output.
FORBIDDEN = re.compile(r"^(open|open64|openat|openat64|creat|creat64|fopen|fopen64|freopen|fdopen|"
                       r"unlink|unlinkat|remove|rename|renameat|mkdir|rmdir|truncate|ftruncate|"
                       r"write|pwrite|pwrite64|read|pread|pread64|fwrite|fread|fputs|puts|printf|fprintf|"
                       r"vfprintf|socket|socketpair|connect|bind|listen|accept|accept4|send|sendto|sendmsg|"
                       r"recv|recvfrom|recvmsg|getaddrinfo|gethostbyname|gethostbyname2|"
                       r"fork|vfork|clone|execl|execlp|execle|execv|execve|execvp|execvpe|system|popen|"
                       r"posix_spawn|posix_spawnp|kill|dlopen|dlmopen|mmap|mmap64|"
                       r"_ZSt4cout|_ZSt4cerr|_ZSt4clog|_ZSt4cin|"
                       r"_ZNSt14basic_ofstream.*|_ZNSt14basic_ifstream.*|_ZNSt13basic_fstream.*)$")


def imported_symbols(library):
    out = subprocess.run(["nm", "-D", "--undefined-only", library], capture_output=True, text=True,
                         check=True).stdout
    return sorted({line.split()[-1].split("@")[0] for line in out.splitlines() if line.strip()})


class AddInDoesNoIo(unittest.TestCase):
    def test_library_in_the_extension_imports_no_io(self):
        work = os.path.join(os.environ.get("TMPDIR", "/tmp"), "solarith-symbols-%d" % os.getpid())
        os.makedirs(work, exist_ok=True)
        with zipfile.ZipFile(os.environ["SOLARITH_OXT"]) as oxt:
            library = oxt.extract("libsolarith.so", work)
        symbols = imported_symbols(library)
        self.assertIn("_ZN4cppu26component_getFactoryHelperEPKcPvS2_PKNS_19ImplementationEntryE", symbols,
                      "nm found the UNO imports, so the check sees the real symbol table")
        bad = [s for s in symbols if FORBIDDEN.match(s)]
        self.assertEqual(bad, [], "the add-in imports I/O functions")
        os.remove(library)
        os.rmdir(work)


if __name__ == "__main__":
    unittest.main(verbosity=2)
