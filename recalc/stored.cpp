// SPDX-License-Identifier: MPL-2.0
#include "stored.hpp"

#include <cstdlib>
#include <cstring>
#include <fstream>
#include <sstream>
#include <vector>

#include <expat.h>
#include <zlib.h>

namespace isentra::recalc {

namespace {

unsigned get16(const std::string& s, std::size_t at) {
    return static_cast<unsigned char>(s[at]) | static_cast<unsigned char>(s[at + 1]) << 8;
}
unsigned long get32(const std::string& s, std::size_t at) {
    return get16(s, at) | static_cast<unsigned long>(get16(s, at + 2)) << 16;
}

std::string inflate_raw(const std::string& in, std::size_t expected) {
    std::string out(expected, '\0');
    z_stream z{};
    if (inflateInit2(&z, -MAX_WBITS) != Z_OK) throw std::runtime_error("zlib inflateInit2 failed");
    z.next_in = reinterpret_cast<Bytef*>(const_cast<char*>(in.data()));
    z.avail_in = static_cast<uInt>(in.size());
    z.next_out = reinterpret_cast<Bytef*>(out.data());
    z.avail_out = static_cast<uInt>(out.size());
    const int rc = inflate(&z, Z_FINISH);
    inflateEnd(&z);
    if (rc != Z_STREAM_END || z.total_out != expected) throw std::runtime_error("a damaged zip member");
    return out;
}

// Expat handlers: the cells of every table:table.
struct Parser {
    StoredValues values;
    std::string sheet;
    int row = 0, col = 0;
    int depth_table = 0;
    // The formula cell being read.
    bool in_cell = false, formula = false;
    int cell_repeat = 1, row_repeat = 1;
    Value value;
    bool is_string = false, is_error = false, has_string_value = false;
    std::string text;
    int p_count = 0;
    bool in_p = false;
    std::vector<std::pair<std::pair<int, int>, Value>> row_cells;  // of the current row (for repeated rows)

    static const char* attr(const char** atts, const char* name) {
        for (int i = 0; atts[i]; i += 2)
            if (std::strcmp(atts[i], name) == 0) return atts[i + 1];
        return nullptr;
    }
    static int repeat(const char** atts, const char* name) {
        const char* r = attr(atts, name);
        const long n = r ? std::strtol(r, nullptr, 10) : 1;
        return n < 1 ? 1 : n > 1048576 ? 1048576 : static_cast<int>(n);
    }

    void start(const char* name, const char** atts) {
        if (std::strcmp(name, "table:table") == 0) {
            const char* n = attr(atts, "table:name");
            sheet = n ? n : "";
            values[sheet];
            row = 0;
            ++depth_table;
        } else if (std::strcmp(name, "table:table-row") == 0) {
            row_repeat = repeat(atts, "table:number-rows-repeated");
            col = 0;
            row_cells.clear();
        } else if (std::strcmp(name, "table:table-cell") == 0 || std::strcmp(name, "table:covered-table-cell") == 0) {
            in_cell = true;
            cell_repeat = repeat(atts, "table:number-columns-repeated");
            formula = attr(atts, "table:formula") != nullptr;
            value = Value{};
            is_string = is_error = has_string_value = false;
            text.clear();
            p_count = 0;
            if (!formula) return;
            const char* type = attr(atts, "office:value-type");
            const char* calcext = attr(atts, "calcext:value-type");
            if (calcext && std::strcmp(calcext, "error") == 0) is_error = true;
            if (!type) return;
            const std::string t = type;
            if (t == "float" || t == "percentage" || t == "currency") {
                const char* v = attr(atts, "office:value");
                if (v) value = Value::of_number(std::strtod(v, nullptr));
            } else if (t == "boolean") {
                const char* v = attr(atts, "office:boolean-value");
                if (v) value = Value::of_number(std::strcmp(v, "true") == 0 ? 1 : 0);
            } else if (t == "string") {
                is_string = true;
                const char* v = attr(atts, "office:string-value");
                if (v && *v) {
                    has_string_value = true;
                    text = v;
                }
            }
            // date, time: stored as texts Calc converts; not compared (no value kept)
        } else if (in_cell && std::strcmp(name, "text:p") == 0) {
            in_p = true;
            if (p_count++ > 0 && !has_string_value) text += '\n';
        } else if (in_p && !has_string_value && std::strcmp(name, "text:s") == 0) {
            text.append(static_cast<std::size_t>(repeat(atts, "text:c")), ' ');
        } else if (in_p && !has_string_value && std::strcmp(name, "text:tab") == 0) {
            text += '\t';
        } else if (in_p && !has_string_value && std::strcmp(name, "text:line-break") == 0) {
            text += '\n';
        }
    }

    void end(const char* name) {
        if (std::strcmp(name, "text:p") == 0) {
            in_p = false;
        } else if (std::strcmp(name, "table:table-cell") == 0 || std::strcmp(name, "table:covered-table-cell") == 0) {
            if (formula) {
                if (is_error || (is_string && !has_string_value && error_code_of(text) != 0))
                    value = Value::of_error(error_code_of(text), text);
                else if (is_string && (has_string_value || p_count > 0))
                    value = Value::of_text(text);  // (a string type without any text: no stored result)
                if (value.kind != Value::Empty)
                    for (int k = 0; k < cell_repeat; ++k) row_cells.push_back({{row, col + k}, value});
            }
            col += cell_repeat;
            in_cell = formula = false;
        } else if (std::strcmp(name, "table:table-row") == 0) {
            auto& sheet_values = values[sheet];
            for (int r = 0; r < row_repeat && !row_cells.empty(); ++r)
                for (const auto& [pos, v] : row_cells) sheet_values[{pos.first + r, pos.second}] = v;
            row += row_repeat;
        } else if (std::strcmp(name, "table:table") == 0) {
            --depth_table;
        }
    }

    void chars(const char* s, int len) {
        if (in_p && formula && !has_string_value) text.append(s, static_cast<std::size_t>(len));
    }
};

}  // namespace

int error_code_of(const std::string& s) {
    if (s.rfind("Err:", 0) == 0) return std::atoi(s.c_str() + 4);
    static const std::pair<const char*, int> names[] = {
        {"#NULL!", 521}, {"#DIV/0!", 532}, {"#VALUE!", 519}, {"#REF!", 524},
        {"#NAME?", 525}, {"#NUM!", 503},   {"#N/A", 32767},
    };
    for (const auto& [n, code] : names)
        if (s == n) return code;
    return 0;
}

std::string zip_member(const std::string& z, const std::string& name) {
    // The end-of-central-directory record, then the central directory.
    if (z.size() < 22) throw std::runtime_error("not a zip archive");
    std::size_t eocd = std::string::npos;
    for (std::size_t i = z.size() - 22 + 1; i-- > 0 && z.size() - i <= 22 + 65535;)
        if (get32(z, i) == 0x06054b50) {
            eocd = i;
            break;
        }
    if (eocd == std::string::npos) throw std::runtime_error("not a zip archive (no central directory)");
    const unsigned entries = get16(z, eocd + 10);
    std::size_t at = get32(z, eocd + 16);
    for (unsigned e = 0; e < entries; ++e) {
        if (at + 46 > z.size() || get32(z, at) != 0x02014b50) throw std::runtime_error("a damaged zip directory");
        const unsigned method = get16(z, at + 10);
        const unsigned long csize = get32(z, at + 20), usize = get32(z, at + 24);
        const unsigned nlen = get16(z, at + 28), xlen = get16(z, at + 30), clen = get16(z, at + 32);
        const unsigned long local = get32(z, at + 42);
        if (at + 46 + nlen > z.size()) throw std::runtime_error("a damaged zip directory");
        const std::string n = z.substr(at + 46, nlen);
        if (n == name) {
            if (local + 30 > z.size() || get32(z, local) != 0x04034b50) throw std::runtime_error("a damaged zip member");
            const std::size_t data = local + 30 + get16(z, local + 26) + get16(z, local + 28);
            if (data + csize > z.size()) throw std::runtime_error("a truncated zip member");
            const std::string raw = z.substr(data, csize);
            if (method == 0) return raw;
            if (method == 8) return inflate_raw(raw, usize);
            throw std::runtime_error("zip method " + std::to_string(method) + " not supported");
        }
        at += 46 + nlen + xlen + clen;
    }
    throw std::runtime_error("no " + name + " in the archive");
}

StoredValues parse_stored_values(const std::string& xml) {
    Parser p;
    XML_Parser x = XML_ParserCreate("UTF-8");
    if (!x) throw std::runtime_error("expat: out of memory");
    XML_SetUserData(x, &p);
    XML_SetElementHandler(
        x, [](void* u, const XML_Char* n, const XML_Char** a) { static_cast<Parser*>(u)->start(n, a); },
        [](void* u, const XML_Char* n) { static_cast<Parser*>(u)->end(n); });
    XML_SetCharacterDataHandler(x, [](void* u, const XML_Char* s, int len) { static_cast<Parser*>(u)->chars(s, len); });
    const bool ok = XML_Parse(x, xml.data(), static_cast<int>(xml.size()), 1) == XML_STATUS_OK;
    const std::string err = ok ? "" : XML_ErrorString(XML_GetErrorCode(x));
    XML_ParserFree(x);
    if (!ok) throw std::runtime_error("content.xml is not well-formed XML: " + err);
    return p.values;
}

StoredValues read_stored_values(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw std::runtime_error("cannot read " + path);
    std::ostringstream s;
    s << in.rdbuf();
    const std::string data = s.str();
    if (data.rfind("PK", 0) == 0) return parse_stored_values(zip_member(data, "content.xml"));
    return parse_stored_values(data);  // flat XML (.fods)
}

}  // namespace isentra::recalc
