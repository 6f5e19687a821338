#!/usr/bin/python3
"""A throwaway LibreOffice with Solarith installed, for the tests and the demo.

Office(oxt) makes a fresh profile in a world-readable temporary directory,
installs the extension there with unopkg, starts a headless soffice.bin
listening on a loopback port, and connects to it. stop() ends that office by
its own pid and removes the directory. Nothing outside the directory changes.

As root, unopkg refuses per-user installs, so the office and unopkg run as
the unprivileged user 'nobody' (setpriv); as any other user they run as that
user. Run with Debian's /usr/bin/python3, which has the 'uno' module.
"""
import os
import pwd
import shutil
import socket
import subprocess
import sys
import tempfile
import time

import uno
from com.sun.star.beans import PropertyValue
from com.sun.star.connection import NoConnectException

PROGRAM_DIR = "/usr/lib/libreoffice/program"
RESTART_EXIT_CODE = 81  # soffice.bin asks to be started again after an extension change
CONNECT_TIMEOUT_S = 120
EXTENSION_IDENTIFIER = "org.solarith.calc"  # packaging/extension/description.xml.in


def props(**values):
    """A tuple of PropertyValue, as UNO calls take them."""
    out = []
    for name, value in values.items():
        p = PropertyValue()
        p.Name = name
        p.Value = value
        out.append(p)
    return tuple(out)


def _free_port():
    with socket.socket(socket.AF_INET, socket.SOCK_STREAM) as s:
        s.bind(("127.0.0.1", 0))
        return s.getsockname()[1]


class Office:
    def __init__(self, oxt, log=sys.stderr):
        self.log = log
        self.workdir = tempfile.mkdtemp(prefix="solarith-office-")
        os.chmod(self.workdir, 0o755)
        self.user = None
        if os.geteuid() == 0:
            self.user = pwd.getpwnam("nobody")
            os.chown(self.workdir, self.user.pw_uid, self.user.pw_gid)
        self.oxt = os.path.join(self.workdir, "solarith.oxt")
        shutil.copyfile(oxt, self.oxt)
        os.chmod(self.oxt, 0o644)
        self.profile_url = uno.systemPathToFileUrl(os.path.join(self.workdir, "profile"))
        self.process = None
        self.context = None
        self.desktop = None

    # -- running programs as the office user ---------------------------------
    def _command(self, args):
        if self.user is None:
            return args
        return ["setpriv", "--reuid=%d" % self.user.pw_uid, "--regid=%d" % self.user.pw_gid,
                "--clear-groups", "--"] + args

    def _environment(self):
        env = dict(os.environ)
        env["HOME"] = self.workdir
        env["TMPDIR"] = self.workdir
        env.pop("PYTHONPATH", None)
        return env

    def own_path(self, name):
        """A path inside the work directory that the office user may write."""
        path = os.path.join(self.workdir, name)
        os.makedirs(path, exist_ok=True)
        if self.user is not None:
            os.chown(path, self.user.pw_uid, self.user.pw_gid)
        return path

    # -- life cycle ----------------------------------------------------------
    def _office_command(self, *extra):
        return self._command([os.path.join(PROGRAM_DIR, "soffice.bin"), "--headless", "--invisible",
                              "--nologo", "--norestore", "--nodefault", "--nolockcheck",
                              "-env:UserInstallation=" + self.profile_url] + list(extra))

    def install(self):
        # The profile must exist before unopkg registers into it: an office that
        # creates a new profile drops component registrations made before it.
        subprocess.run(self._office_command("--terminate_after_init"), env=self._environment(),
                       cwd=self.workdir, stdin=subprocess.DEVNULL, capture_output=True, timeout=300, check=True)
        self._unopkg("add", "--suppress-license", self.oxt)
        return self

    def _unopkg(self, *args):
        cmd = self._command([os.path.join(PROGRAM_DIR, "unopkg")] + list(args)
                            + ["-env:UserInstallation=" + self.profile_url])
        result = subprocess.run(cmd, env=self._environment(), cwd=self.workdir, stdin=subprocess.DEVNULL,
                                capture_output=True, text=True, timeout=300)
        if result.returncode != 0:
            raise RuntimeError("unopkg %s failed (%d): %s%s" % (args[0], result.returncode, result.stdout,
                                                                result.stderr))

    def start(self):
        for _attempt in range(3):
            self.port = _free_port()
            cmd = self._office_command(
                "--accept=socket,host=127.0.0.1,port=%d;urp;StarOffice.ComponentContext" % self.port)
            office_log = os.environ.get("SOLARITH_OFFICE_LOG")  # a file for the office's own messages
            output = open(office_log, "ab") if office_log else subprocess.DEVNULL
            self.process = subprocess.Popen(cmd, env=self._environment(), cwd=self.workdir,
                                            stdin=subprocess.DEVNULL, stdout=output, stderr=output)
            if self._connect():
                return self
            code = self.process.wait(timeout=60)
            if code != RESTART_EXIT_CODE:
                raise RuntimeError("soffice.bin exited with %d before accepting connections" % code)
            print("office asked for a restart (exit %d); starting it again" % code, file=self.log)
        raise RuntimeError("the office did not start")

    def _connect(self):
        local = uno.getComponentContext()
        resolver = local.ServiceManager.createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local)
        url = "uno:socket,host=127.0.0.1,port=%d;urp;StarOffice.ComponentContext" % self.port
        deadline = time.monotonic() + CONNECT_TIMEOUT_S
        while time.monotonic() < deadline:
            if self.process.poll() is not None:
                return False
            try:
                self.context = resolver.resolve(url)
                self.desktop = self.context.ServiceManager.createInstanceWithContext(
                    "com.sun.star.frame.Desktop", self.context)
                return True
            except NoConnectException:
                time.sleep(0.25)
        raise RuntimeError("no connection to the office within %d s" % CONNECT_TIMEOUT_S)

    def alive(self):
        return self.process is not None and self.process.poll() is None

    def shutdown(self):
        """Ends the office process (by its own pid if it does not quit); keeps the profile."""
        if self.process is None:
            return
        try:
            if self.desktop is not None and self.alive():
                self.desktop.terminate()
        except Exception:  # the bridge goes down with the office; nothing to report
            pass
        try:
            self.process.wait(timeout=30)
        except subprocess.TimeoutExpired:
            self.process.kill()
            self.process.wait(timeout=30)
        self.process = None
        self.context = None
        self.desktop = None

    def stop(self):
        self.shutdown()
        shutil.rmtree(self.workdir, ignore_errors=True)

    def uninstall(self):
        """Removes the extension from the profile (the office must be shut down)."""
        self._unopkg("remove", EXTENSION_IDENTIFIER)
        return self

    def __enter__(self):
        return self.install().start()

    def __exit__(self, *exc):
        self.stop()

    # -- documents -----------------------------------------------------------
    def create(self, service):
        return self.context.ServiceManager.createInstanceWithContext(service, self.context)

    def new_spreadsheet(self):
        return self.desktop.loadComponentFromURL("private:factory/scalc", "_blank", 0, props(Hidden=True))

    def load(self, path):
        """Opens a copy of the document: the office user may not be able to read the checkout."""
        copy = os.path.join(self.own_path("opened"), os.path.basename(path))
        if os.path.abspath(path) != copy:
            shutil.copyfile(path, copy)
            os.chmod(copy, 0o644)
        return self.desktop.loadComponentFromURL(uno.systemPathToFileUrl(copy), "_blank", 0, props(Hidden=True))

    def store(self, document, path, filter_name):
        """Save a copy: 'calc8' for .ods, 'OpenDocument Spreadsheet Flat XML' for .fods, 'calc_pdf_Export'."""
        document.storeToURL(uno.systemPathToFileUrl(os.path.abspath(path)), props(FilterName=filter_name))


def main():
    import argparse
    parser = argparse.ArgumentParser(description="Install solarith.oxt into a throwaway office and check it loads.")
    parser.add_argument("oxt")
    args = parser.parse_args()
    with Office(args.oxt) as office:
        doc = office.new_spreadsheet()
        cell = doc.Sheets.getByIndex(0).getCellByPosition(0, 0)
        cell.setFormula("=FN_METHOD(\"RAD_EMISSIVE\")")
        doc.calculateAll()
        print(cell.getString())
        doc.close(True)


if __name__ == "__main__":
    main()
