#!/usr/bin/python3
# SPDX-License-Identifier: MPL-2.0
"""Lists the templates LibreOffice's template dialog offers in the category
"Isentra" (the blank workbooks the extension installs through Paths.xcu).

Run with Debian's /usr/bin/python3 (python3-uno) as the same user as an office
started with --accept="pipe,name=PIPE;urp;StarOffice.ComponentContext":

    /usr/bin/python3 templates/list_templates.py PIPE

Prints the template path and one line per template; exits 1 if there is none.
"""
import sys
import time
import uno
from com.sun.star.connection import NoConnectException
local = uno.getComponentContext()
res = local.ServiceManager.createInstanceWithContext("com.sun.star.bridge.UnoUrlResolver", local)
for i in range(60):
    try:
        ctx = res.resolve("uno:pipe,name=%s;urp;StarOffice.ComponentContext" % sys.argv[1]); break
    except NoConnectException:
        time.sleep(0.5)
smgr = ctx.ServiceManager
print("template path:", smgr.createInstanceWithContext("com.sun.star.util.PathSettings", ctx).Template)
dt = smgr.createInstanceWithContext("com.sun.star.frame.DocumentTemplates", ctx)
dt.update()
sfa = smgr.createInstanceWithContext("com.sun.star.ucb.SimpleFileAccess", ctx)
root = "vnd.sun.star.hier:/templates"
groups = sfa.getFolderContents(root, True)
found = 0
for g in groups:
    for c in sfa.getFolderContents(g, True):
        if c.endswith("/Isentra"):
            print("category", c)
            for t in sfa.getFolderContents(c, True):
                print("  template", uno.fileUrlToSystemPath(t) if t.startswith("file:") else t)
                found += 1
sys.exit(0 if found else 1)
