// SPDX-License-Identifier: MPL-2.0
// The state solver against an independent IAPWS-IF97 oracle.
//
// Every expected value in tests/data/if97_oracle.csv comes from
// python3-iapws 1.5.2 (Debian), written by tests/oracle/gen_if97.py (fixed
// seeds; regenerate with Debian's /usr/bin/python3). The file's comment
// header and its `source` column name that library on every row. The
// generator leaves out the places where that library is known to be wrong
// (two-phase above 623.15 K, (h,s) in region 5, p < 611 Pa, exact boundaries).
//
// Tolerances (the project's accuracy targets, not to be loosened):
//   (p,T) forward: v, h, s, u, cp, cv, w within 1e-9 relative
//   (p,h), (p,s):  T within 1e-6 K
//   (h,s):         p within 1e-9 relative, T within 1e-6 K
//   (p,x), (T,x):  h, s, v within 1e-9 relative (and T resp. p)
// "Relative" divides by max(|expected|, 1 unit) for h, u (kJ/kg) and s
// (kJ/(kg K)): those cross zero at the IF97 reference state (u' = s' = 0 at
// the triple point), where a pure relative error has no meaning; there the
// same 1e-9 applies as an absolute error in kJ/kg or kJ/(kg K).
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <fstream>
#include <limits>
#include <map>
#include <sstream>
#include <string>
#include <vector>

#include "isentra/base/error.hpp"
#include "isentra/properties/state.hpp"

namespace {

constexpr double kRel = 1e-9;    // relative tolerance of properties
constexpr double kTolT = 1e-6;   // K, inverse temperatures
constexpr std::size_t kMinRows = 10000;
const char* const kSource = "python3-iapws 1.5.2 (Debian)";

struct Row {
    std::string kind;
    int region = 0;
    double p, T, x, v, h, s, u, cp, cv, w;
    int line = 0;
};

struct OracleFile {
    std::vector<Row> rows;
    bool header_names_source = false;   // comment header
    bool column_names_source = false;   // CSV header line has a source column
    bool rows_name_source = true;       // every row's source field
    std::string error;
};

double field(const std::string& s) {
    if (s.empty()) return std::numeric_limits<double>::quiet_NaN();
    return std::stod(s);
}

OracleFile load() {
    OracleFile f;
    const std::string path = std::string(ISENTRA_TEST_DATA_DIR) + "/if97_oracle.csv";
    std::ifstream in(path);
    if (!in) {
        f.error = "cannot open " + path;
        return f;
    }
    std::string line;
    bool header_seen = false;
    int lineno = 0;
    while (std::getline(in, line)) {
        ++lineno;
        if (line.empty()) continue;
        if (line[0] == '#') {
            if (line.find(kSource) != std::string::npos) f.header_names_source = true;
            continue;
        }
        if (!header_seen) {
            header_seen = true;
            f.column_names_source = line.rfind(",source") != std::string::npos;
            continue;
        }
        std::vector<std::string> c;
        std::stringstream ss(line);
        std::string item;
        while (std::getline(ss, item, ',')) c.push_back(item);
        if (c.size() != 13) {
            f.error = "line " + std::to_string(lineno) + ": expected 13 fields";
            return f;
        }
        Row r;
        r.kind = c[0];
        r.region = std::stoi(c[1]);
        r.p = field(c[2]);
        r.T = field(c[3]);
        r.x = field(c[4]);
        r.v = field(c[5]);
        r.h = field(c[6]);
        r.s = field(c[7]);
        r.u = field(c[8]);
        r.cp = field(c[9]);
        r.cv = field(c[10]);
        r.w = field(c[11]);
        r.line = lineno;
        if (c[12] != kSource) f.rows_name_source = false;
        f.rows.push_back(r);
    }
    return f;
}

const OracleFile& oracle() {
    static const OracleFile f = load();
    return f;
}

// Collects deviations of one kind of check; prints a summary and the first
// few failures.
class Tally {
public:
    explicit Tally(std::string kind) : kind_(std::move(kind)) {}

    // dev: the deviation (relative, or absolute where the name carries a unit)
    void add(const std::string& quantity, double dev, double tol, const Row& r, double got,
             double want) {
        auto& m = max_[quantity];
        if (!(dev <= m.dev)) {  // NaN counts as worst
            m.dev = std::isnan(dev) ? std::numeric_limits<double>::infinity() : dev;
            m.line = r.line;
        }
        if (!(dev <= tol)) fail(r, quantity + ": got " + fmt(got) + " want " + fmt(want) +
                                       " dev " + fmt(dev) + " tol " + fmt(tol));
    }

    void fail(const Row& r, const std::string& what) {
        ++failures_;
        if (failures_ <= 12) {
            char buf[256];
            std::snprintf(buf, sizeof buf, "[%s line %d region %d p=%.17g T=%.17g x=%.17g h=%.17g s=%.17g] ",
                          kind_.c_str(), r.line, r.region, r.p, r.T, r.x, r.h, r.s);
            ADD_FAILURE() << buf << what << "   (expected: " << kSource << ")";
        }
    }

    void row() { ++rows_; }

    // A second exact IF97 root at a region seam (see other_root): counted, not failed.
    void seam(const Row& r, const isentra::State& st) {
        ++seams_;
        if (seams_ <= 3)
            std::printf("[oracle %s]   other IF97 root at a seam, csv line %d: region %d p=%.17g "
                        "T=%.17g (oracle: region %d p=%.17g T=%.17g)\n",
                        kind_.c_str(), r.line, st.region, st.p, st.T, r.region, r.p, r.T);
    }

    void finish() {
        std::printf("[oracle %s] %zu states checked against %s, %zu failing, %zu other roots at "
                    "region seams\n",
                    kind_.c_str(), rows_, kSource, failures_, seams_);
        for (const auto& [q, m] : max_)
            std::printf("[oracle %s]   max deviation %-12s %.3e (csv line %d)\n", kind_.c_str(),
                        q.c_str(), m.dev, m.line);
        ::testing::Test::RecordProperty(kind_ + "_checked", static_cast<int>(rows_));
        ::testing::Test::RecordProperty(kind_ + "_failing", static_cast<int>(failures_));
        EXPECT_GT(rows_, 0u) << "no " << kind_ << " rows in the oracle file";
        EXPECT_EQ(failures_, 0u) << kind_ << ": " << failures_ << " of " << rows_
                                 << " states outside tolerance";
    }

private:
    static std::string fmt(double v) {
        char b[40];
        std::snprintf(b, sizeof b, "%.17g", v);
        return b;
    }
    struct Max {
        double dev = 0;
        int line = 0;
    };
    std::string kind_;
    std::size_t rows_ = 0, failures_ = 0, seams_ = 0;
    std::map<std::string, Max> max_;
};

double rel(double got, double want, double floor = 0.0) {
    return std::fabs(got - want) / std::max(std::fabs(want), floor);
}

void check_region(Tally& t, const Row& r, const isentra::State& st) {
    if (st.region != r.region)
        t.fail(r, "region " + std::to_string(st.region) + " want " + std::to_string(r.region));
}

// IF97's regions meet at seams (T = 623.15 K between 1 and 3, B23 between 2
// and 3, T = 1073.15 K between 2 and 5) where the two equations agree only
// within the consistency limits of R7-97(2012); close to a seam an inverse
// pair can have two exact solutions, one in each region, some mK apart. A
// result in the neighbouring region is accepted (and counted) only if
// (p', T') really belongs to that region and its basic equation reproduces
// the given inputs within 1e-9. Anything else stays a failure.
//
// The saturation line has the same kind of seam at 623.15 K: below it the
// saturated phases come from regions 1 and 2, above it from region 3
// (R7-97(2012) Sec. 10.2 and Table 44), so a wet (h,s) within ~1 mK of
// 623.15 K can have an exact wet solution on either side. Accepted likewise
// if the wet state at (p', x') reproduces h and s within 1e-9.
bool other_root(const isentra::State& b, int orig_region, double p_in, double h_in, double s_in) {
    if (b.region == 4 && orig_region == 4) {
        if (!(std::fabs(b.T - 623.15) < 0.01)) return false;  // R7-97(2012) Sec. 4: T_13 = 623.15 K
        try {
            const isentra::State c = isentra::state_px(b.p, b.x);
            auto close = [](double a, double w) {
                return std::isnan(w) || std::fabs(a - w) <= kRel * std::max(std::fabs(w), 1.0);
            };
            return close(c.h, h_in) && close(c.s, s_in);
        } catch (const std::exception&) {
            return false;
        }
    }
    const int r1 = std::min(orig_region, b.region), r2 = std::max(orig_region, b.region);
    if (!((r1 == 1 && r2 == 3) || (r1 == 2 && r2 == 3) || (r1 == 2 && r2 == 5))) return false;
    try {
        const isentra::State c = isentra::state_pT(b.p, b.T);
        if (c.region != b.region) return false;
        auto close = [](double a, double w, double floor) {
            return std::isnan(w) || std::fabs(a - w) <= kRel * std::max(std::fabs(w), floor);
        };
        return close(b.p, p_in, 0.0) && close(c.h, h_in, 1.0) && close(c.s, s_in, 1.0);
    } catch (const std::exception&) {
        return false;
    }
}
constexpr double kNone = std::numeric_limits<double>::quiet_NaN();

bool finite_core(const isentra::State& st) {
    return std::isfinite(st.h) && std::isfinite(st.s) && std::isfinite(st.v) &&
           std::isfinite(st.T) && std::isfinite(st.p);
}

template <class Fn>
void run_kind(const std::string& kind, Fn check) {
    const OracleFile& f = oracle();
    ASSERT_TRUE(f.error.empty()) << f.error;
    Tally t(kind);
    for (const Row& r : f.rows) {
        if (r.kind != kind) continue;
        t.row();
        try {
            check(t, r);
        } catch (const isentra::Error& e) {
            t.fail(r, std::string("threw isentra::Error: ") + e.what());
        } catch (const std::exception& e) {
            t.fail(r, std::string("threw a foreign exception: ") + e.what());
        }
    }
    t.finish();
}

}  // namespace

TEST(OracleIF97, FileIsPresentAndLarge) {
    const OracleFile& f = oracle();
    ASSERT_TRUE(f.error.empty()) << f.error;
    std::map<std::string, std::size_t> n;
    for (const Row& r : f.rows) ++n[r.kind];
    std::printf("[oracle] %zu rows read:", f.rows.size());
    for (const auto& [k, c] : n) std::printf(" %s=%zu", k.c_str(), c);
    std::printf("\n");
    ::testing::Test::RecordProperty("rows", static_cast<int>(f.rows.size()));
    EXPECT_GE(f.rows.size(), kMinRows) << "oracle file too small: it must not pass silently";
    EXPECT_TRUE(f.header_names_source) << "comment header must name " << kSource;
    EXPECT_TRUE(f.column_names_source) << "CSV header must have the source column";
    EXPECT_TRUE(f.rows_name_source) << "every row must name " << kSource;
    for (const char* k : {"pT", "ph", "ps", "hs", "px", "Tx"}) EXPECT_GT(n[k], 100u) << k;
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, ForwardPT) {
    run_kind("pT", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_pT(r.p, r.T);
        t.add("v", rel(st.v, r.v), kRel, r, st.v, r.v);
        t.add("h", rel(st.h, r.h, 1.0), kRel, r, st.h, r.h);
        t.add("s", rel(st.s, r.s, 1.0), kRel, r, st.s, r.s);
        t.add("u", rel(st.u, r.u, 1.0), kRel, r, st.u, r.u);
        t.add("cp", rel(st.cp, r.cp), kRel, r, st.cp, r.cp);
        t.add("cv", rel(st.cv, r.cv), kRel, r, st.cv, r.cv);
        t.add("w", rel(st.w, r.w), kRel, r, st.w, r.w);
        check_region(t, r, st);
    });
}

// Inside the dome the quality comes back too: x within 1e-9 (absolute).
static void check_wet_x(Tally& t, const Row& r, const isentra::State& st) {
    if (r.region != 4) return;
    t.add("x (dome)", std::fabs(st.x - r.x), kRel, r, st.x, r.x);
    if (st.phase != isentra::Phase::TwoPhase)
        t.fail(r, std::string("phase ") + isentra::phase_name(st.phase) + " want TwoPhase");
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, InversePH) {
    run_kind("ph", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_ph(r.p, r.h);
        if (!finite_core(st)) t.fail(r, "NaN in the state");
        if (std::fabs(st.T - r.T) > kTolT && other_root(st, r.region, r.p, r.h, kNone))
            return t.seam(r, st);
        check_wet_x(t, r, st);
        t.add("T [K]", std::fabs(st.T - r.T), kTolT, r, st.T, r.T);
        check_region(t, r, st);
    });
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, InversePS) {
    run_kind("ps", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_ps(r.p, r.s);
        if (!finite_core(st)) t.fail(r, "NaN in the state");
        if (std::fabs(st.T - r.T) > kTolT && other_root(st, r.region, r.p, kNone, r.s))
            return t.seam(r, st);
        check_wet_x(t, r, st);
        t.add("T [K]", std::fabs(st.T - r.T), kTolT, r, st.T, r.T);
        check_region(t, r, st);
    });
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, InverseHS) {
    run_kind("hs", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_hs(r.h, r.s);
        if (!finite_core(st)) t.fail(r, "NaN in the state");
        if ((std::fabs(st.T - r.T) > kTolT || rel(st.p, r.p) > kRel) &&
            other_root(st, r.region, kNone, r.h, r.s))
            return t.seam(r, st);
        check_wet_x(t, r, st);
        t.add("p", rel(st.p, r.p), kRel, r, st.p, r.p);
        t.add("T [K]", std::fabs(st.T - r.T), kTolT, r, st.T, r.T);
        check_region(t, r, st);
    });
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, WetPX) {
    run_kind("px", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_px(r.p, r.x);
        t.add("T [K]", std::fabs(st.T - r.T), kTolT, r, st.T, r.T);
        t.add("h", rel(st.h, r.h, 1.0), kRel, r, st.h, r.h);
        t.add("s", rel(st.s, r.s, 1.0), kRel, r, st.s, r.s);
        t.add("v", rel(st.v, r.v), kRel, r, st.v, r.v);
        if (st.phase != isentra::Phase::TwoPhase)
            t.fail(r, std::string("phase ") + isentra::phase_name(st.phase));
        check_region(t, r, st);
    });
}

// Source of expected values: python3-iapws 1.5.2 (Debian), tests/data/if97_oracle.csv.
TEST(OracleIF97, WetTX) {
    run_kind("Tx", [](Tally& t, const Row& r) {
        const isentra::State st = isentra::state_Tx(r.T, r.x);
        t.add("p", rel(st.p, r.p), kRel, r, st.p, r.p);
        t.add("h", rel(st.h, r.h, 1.0), kRel, r, st.h, r.h);
        t.add("s", rel(st.s, r.s, 1.0), kRel, r, st.s, r.s);
        t.add("v", rel(st.v, r.v), kRel, r, st.v, r.v);
        if (st.phase != isentra::Phase::TwoPhase)
            t.fail(r, std::string("phase ") + isentra::phase_name(st.phase));
        check_region(t, r, st);
    });
}
