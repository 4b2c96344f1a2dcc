// SPDX-License-Identifier: MPL-2.0
#include "report.hpp"

#include <cerrno>
#include <cstdio>
#include <cstring>
#include <fcntl.h>
#include <stdexcept>
#include <unistd.h>

#include <zlib.h>

namespace isentra::recalc {

namespace {

std::string plural(std::size_t n, const char* one, const char* many) {
    return std::to_string(n) + " " + (n == 1 ? one : many);
}

std::string xml_escape(const std::string& s) {
    std::string r;
    r.reserve(s.size());
    for (char c : s) {
        switch (c) {
        case '&': r += "&amp;"; break;
        case '<': r += "&lt;"; break;
        case '>': r += "&gt;"; break;
        case '"': r += "&quot;"; break;
        default:
            // Control characters other than tab/newline are not allowed in XML 1.0.
            if (static_cast<unsigned char>(c) < 0x20 && c != '\t' && c != '\n') r += ' ';
            else r += c;
        }
    }
    return r;
}

Value text(std::string s) { return Value::of_text(std::move(s)); }
Value number(double v) { return Value::of_number(v); }

void put16(std::string& s, unsigned v) {
    s += static_cast<char>(v & 0xff);
    s += static_cast<char>((v >> 8) & 0xff);
}
void put32(std::string& s, unsigned long v) {
    put16(s, static_cast<unsigned>(v & 0xffff));
    put16(s, static_cast<unsigned>((v >> 16) & 0xffff));
}

}  // namespace

std::string summary_line(const FileResult& r) {
    std::string s = r.name;
    if (r.case_number) s += " (case " + std::to_string(r.case_number) + ")";
    s += ": ";
    if (r.failed) return s + "FAILED: " + r.reason;
    const Counts n = count(r.changes);
    if (n.total() == 0) s += "no changes";
    else {
        s += plural(n.total(), "change", "changes") + " (";
        std::string parts;
        auto add = [&](std::size_t k, const char* one, const char* many) {
            if (k) parts += (parts.empty() ? "" : ", ") + plural(k, one, many);
        };
        add(n.value, "value changed", "values changed");
        add(n.new_error, "new error", "new errors");
        add(n.error_gone, "error gone", "errors gone");
        add(n.unknown_name, "unknown function", "unknown functions");
        add(n.type_changed, "type changed", "types changed");
        s += parts + ")";
    }
    s += " in " + plural(r.formula_cells, "formula cell", "formula cells");
    if (!r.copy.empty()) s += " -> " + r.copy;
    if (!r.note.empty()) s += " (" + r.note + ")";
    return s;
}

Table summary_table(const std::vector<FileResult>& results) {
    Table t{"Summary",
            {"file", "case", "status", "formula cells", "changes", "values changed", "new errors", "errors gone",
             "unknown functions", "types changed", "recalculated copy", "note", "seconds",
             "recalculation seconds"},
            {}};
    std::size_t files = 0, failed = 0, changed = 0;
    for (const FileResult& r : results) {
        const Counts n = count(r.changes);
        ++files;
        if (r.failed) ++failed;
        else if (n.total()) ++changed;
        t.rows.push_back({text(r.name), r.case_number ? number(r.case_number) : Value{},
                          text(r.failed ? "failed: " + r.reason : n.total() ? "changed" : "no changes"),
                          number(static_cast<double>(r.formula_cells)), number(static_cast<double>(n.total())),
                          number(static_cast<double>(n.value)), number(static_cast<double>(n.new_error)),
                          number(static_cast<double>(n.error_gone)), number(static_cast<double>(n.unknown_name)),
                          number(static_cast<double>(n.type_changed)), text(r.copy), text(r.note), number(r.seconds),
                          number(r.recalc_seconds)});
    }
    t.rows.push_back({});
    t.rows.push_back({text("total"), Value{},
                      text(plural(files, "file", "files") + ", " + std::to_string(changed) + " with changes, " +
                           std::to_string(failed) + " failed")});
    return t;
}

Table changes_table(const std::vector<FileResult>& results) {
    Table t{"Changes",
            {"file", "case", "sheet", "cell", "label", "change", "formula", "old", "new", "difference", "detail"},
            {}};
    for (const FileResult& r : results)
        for (const Change& c : r.changes) {
            auto val = [](const Value& v) { return v.kind == Value::Number ? v : text(to_string(v)); };
            t.rows.push_back({text(r.name), r.case_number ? number(r.case_number) : Value{}, text(c.sheet),
                              text(c.cell), text(c.label), text(to_string(c.kind)), text(c.formula), val(c.before),
                              val(c.after), std::isnan(c.difference) ? Value{} : number(c.difference),
                              text(c.detail)});
        }
    if (t.rows.empty()) t.rows.push_back({text("no changes")});
    return t;
}

Table cases_table(const std::vector<FileResult>& results, const CaseTable& cases,
                  const std::vector<CellAddress>& collect) {
    Table t{"Cases", {"file", "case"}, {}};
    for (const CellAddress& a : cases.inputs) t.header.push_back(a.text());
    for (const CellAddress& a : collect) t.header.push_back(a.text());
    t.header.push_back("status");
    for (const FileResult& r : results) {
        std::vector<Value> row{text(r.name), number(r.case_number)};
        if (r.case_number >= 1 && static_cast<std::size_t>(r.case_number) <= cases.rows.size())
            for (const std::string& v : cases.rows[static_cast<std::size_t>(r.case_number - 1)]) {
                char* end = nullptr;
                const double d = std::strtod(v.c_str(), &end);
                row.push_back(!v.empty() && end && *end == '\0' ? number(d) : text(v));
            }
        for (std::size_t k = 0; k < collect.size(); ++k) {
            if (k < r.collected.size()) {
                const Value& v = r.collected[k];
                row.push_back(v.kind == Value::Number ? v : text(to_string(v)));
            } else row.push_back(Value{});
        }
        row.push_back(text(r.failed ? "failed: " + r.reason : "recalculated"));
        t.rows.push_back(std::move(row));
    }
    return t;
}

std::string to_csv(const Table& t) {
    auto field = [](const std::string& s) {
        if (s.find_first_of(",\"\n\r") == std::string::npos) return s;
        std::string q = "\"";
        for (char c : s) q += c == '"' ? std::string("\"\"") : std::string(1, c);
        return q + "\"";
    };
    std::string out;
    auto line = [&](const std::vector<std::string>& cells) {
        for (std::size_t i = 0; i < cells.size(); ++i) out += (i ? "," : "") + field(cells[i]);
        out += "\r\n";
    };
    line(t.header);
    for (const auto& r : t.rows) {
        std::vector<std::string> cells;
        for (const Value& v : r) cells.push_back(to_string(v));
        line(cells);
    }
    return out;
}

std::string to_ods(const std::vector<Table>& tables) {
    const std::string ns =
        "xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\" "
        "xmlns:style=\"urn:oasis:names:tc:opendocument:xmlns:style:1.0\" "
        "xmlns:text=\"urn:oasis:names:tc:opendocument:xmlns:text:1.0\" "
        "xmlns:table=\"urn:oasis:names:tc:opendocument:xmlns:table:1.0\" "
        "xmlns:fo=\"urn:oasis:names:tc:opendocument:xmlns:xsl-fo-compatible:1.0\" "
        "xmlns:meta=\"urn:oasis:names:tc:opendocument:xmlns:meta:1.0\" "
        "xmlns:manifest=\"urn:oasis:names:tc:opendocument:xmlns:manifest:1.0\" office:version=\"1.3\"";
    // Column widths from the longest text in each column (about 0.2 cm a character).
    std::string styles, body;
    for (std::size_t ti = 0; ti < tables.size(); ++ti) {
        const Table& t = tables[ti];
        std::size_t ncol = t.header.size();
        for (const auto& r : t.rows) ncol = std::max(ncol, r.size());
        std::vector<std::size_t> longest(ncol, 4);
        for (std::size_t c = 0; c < t.header.size(); ++c) longest[c] = std::max(longest[c], t.header[c].size());
        for (const auto& r : t.rows)
            for (std::size_t c = 0; c < r.size(); ++c)
                if (!(t.name == "Summary" && c == 2 && r.size() == 3))  // the total line's sentence may overflow
                    longest[c] = std::max(longest[c], to_string(r[c]).size());
        body += "<table:table table:name=\"" + xml_escape(t.name) + "\">";
        for (std::size_t c = 0; c < ncol; ++c) {
            const std::string name = "co" + std::to_string(ti) + "_" + std::to_string(c);
            const double cm = std::min(14.0, std::max(1.8, 0.2 * static_cast<double>(longest[c]) + 0.4));
            char w[32];
            std::snprintf(w, sizeof w, "%.1fcm", cm);
            styles += "<style:style style:name=\"" + name + "\" style:family=\"table-column\">"
                      "<style:table-column-properties style:column-width=\"" + std::string(w) + "\"/></style:style>";
            body += "<table:table-column table:style-name=\"" + name + "\"/>";
        }
        if (ncol == 0) body += "<table:table-column/>";
        body += "<table:table-row>";
        for (const std::string& h : t.header)
            body += "<table:table-cell table:style-name=\"head\" office:value-type=\"string\"><text:p>" + xml_escape(h) +
                 "</text:p></table:table-cell>";
        if (t.header.empty()) body += "<table:table-cell/>";
        body += "</table:table-row>";
        for (const auto& r : t.rows) {
            body += "<table:table-row>";
            for (const Value& v : r) {
                if (v.kind == Value::Number && std::isfinite(v.number))
                    body += "<table:table-cell office:value-type=\"float\" office:value=\"" + format_number(v.number) +
                         "\"><text:p>" + format_number(v.number) + "</text:p></table:table-cell>";
                else if (v.kind == Value::Empty) body += "<table:table-cell/>";
                else
                    body += "<table:table-cell office:value-type=\"string\"><text:p>" + xml_escape(to_string(v)) +
                         "</text:p></table:table-cell>";
            }
            if (r.empty()) body += "<table:table-cell/>";
            body += "</table:table-row>";
        }
        body += "</table:table>";
    }
    const std::string content = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<office:document-content " + ns +
                                "><office:automatic-styles>"
                                "<style:style style:name=\"head\" style:family=\"table-cell\">"
                                "<style:text-properties fo:font-weight=\"bold\"/></style:style>" +
                                styles + "</office:automatic-styles><office:body><office:spreadsheet>" + body +
                                "</office:spreadsheet></office:body></office:document-content>\n";
    const std::string manifest =
        "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
        "<manifest:manifest xmlns:manifest=\"urn:oasis:names:tc:opendocument:xmlns:manifest:1.0\" "
        "manifest:version=\"1.3\">"
        "<manifest:file-entry manifest:full-path=\"/\" manifest:version=\"1.3\" "
        "manifest:media-type=\"application/vnd.oasis.opendocument.spreadsheet\"/>"
        "<manifest:file-entry manifest:full-path=\"content.xml\" manifest:media-type=\"text/xml\"/>"
        "<manifest:file-entry manifest:full-path=\"meta.xml\" manifest:media-type=\"text/xml\"/>"
        "</manifest:manifest>\n";
    const std::string meta = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<office:document-meta " + ns +
                             "><office:meta><meta:generator>isentra-recalc</meta:generator></office:meta>"
                             "</office:document-meta>\n";
    return zip_stored({{"mimetype", "application/vnd.oasis.opendocument.spreadsheet"},
                       {"META-INF/manifest.xml", manifest},
                       {"meta.xml", meta},
                       {"content.xml", content}});
}

std::string zip_stored(const std::vector<std::pair<std::string, std::string>>& entries) {
    std::string out, central;
    const unsigned dos_time = 0, dos_date = (2026 - 1980) << 9 | 1 << 5 | 1;  // fixed: reproducible files
    for (const auto& [name, data] : entries) {
        const unsigned long crc =
            crc32(crc32(0L, Z_NULL, 0), reinterpret_cast<const Bytef*>(data.data()), static_cast<uInt>(data.size()));
        const unsigned long offset = out.size();
        put32(out, 0x04034b50);
        put16(out, 10);  // version needed
        put16(out, 0x0800);  // UTF-8 names
        put16(out, 0);   // stored
        put16(out, dos_time);
        put16(out, dos_date);
        put32(out, crc);
        put32(out, data.size());
        put32(out, data.size());
        put16(out, static_cast<unsigned>(name.size()));
        put16(out, 0);
        out += name;
        out += data;
        put32(central, 0x02014b50);
        put16(central, 20);
        put16(central, 10);
        put16(central, 0x0800);
        put16(central, 0);
        put16(central, dos_time);
        put16(central, dos_date);
        put32(central, crc);
        put32(central, data.size());
        put32(central, data.size());
        put16(central, static_cast<unsigned>(name.size()));
        put16(central, 0);
        put16(central, 0);
        put16(central, 0);
        put16(central, 0);
        put32(central, 0);
        put32(central, offset);
        central += name;
    }
    const unsigned long cd_offset = out.size();
    out += central;
    put32(out, 0x06054b50);
    put16(out, 0);
    put16(out, 0);
    put16(out, static_cast<unsigned>(entries.size()));
    put16(out, static_cast<unsigned>(entries.size()));
    put32(out, central.size());
    put32(out, cd_offset);
    put16(out, 0);
    return out;
}

void write_new_file(const std::string& path, const std::string& data) {
    const int fd = ::open(path.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0644);
    if (fd < 0) throw std::runtime_error("cannot create " + path + ": " + std::strerror(errno));
    std::size_t done = 0;
    while (done < data.size()) {
        const ssize_t n = ::write(fd, data.data() + done, data.size() - done);
        if (n < 0) {
            if (errno == EINTR) continue;
            const int e = errno;
            ::close(fd);
            throw std::runtime_error("cannot write " + path + ": " + std::strerror(e));
        }
        done += static_cast<std::size_t>(n);
    }
    if (::close(fd) != 0) throw std::runtime_error("cannot write " + path + ": " + std::strerror(errno));
}

}  // namespace isentra::recalc
