// SPDX-License-Identifier: MPL-2.0
// Timing of region 3 from (p,T): SR5-05(2016) backward v(p,T) alone, the
// exact density on Eq. 28 (region3_pT), and the region-3 saturation pair.
#include <benchmark/benchmark.h>

#include <vector>

#include "isentra/if97/if97.hpp"

namespace {

using namespace isentra::if97;

struct PT {
    double p, T;
};

// A fixed spread of states over region 3 away from the critical point.
std::vector<PT> grid_away_from_critical() {
    std::vector<PT> v;
    for (int i = 0; i < 16; ++i) {
        const double T = 625.0 + 235.0 * i / 15.0;
        const double plo = b23_p(T) + 0.5;
        for (int j = 0; j < 16; ++j) {
            const double p = plo + (99.5 - plo) * j / 15.0;
            if (T > 640.0 && T < 655.0 && p > 19.0 && p < 25.0) continue;
            if (T < Tc && p > psat(T) * 0.98 && p < psat(T) * 1.02) continue;
            v.push_back({p, T});
        }
    }
    return v;
}

// States within a few kelvin and a few tenths of a MPa of the critical point.
std::vector<PT> grid_near_critical() {
    std::vector<PT> v;
    for (int i = 0; i < 12; ++i) {
        const double T = 644.0 + 6.0 * i / 11.0;
        for (int j = 0; j < 12; ++j) {
            const double p = 21.5 + 1.0 * j / 11.0;
            if (T < Tc && p > psat(T) * 0.9999 && p < psat(T) * 1.0001) continue;
            v.push_back({p, T});
        }
    }
    return v;
}

void BM_region3_v_pT(benchmark::State& st) {
    const auto g = grid_away_from_critical();
    std::size_t k = 0;
    for (auto _ : st) {
        const PT& s = g[k++ % g.size()];
        benchmark::DoNotOptimize(region3_v_pT(s.p, s.T));
    }
}
BENCHMARK(BM_region3_v_pT);

void BM_region3_pT(benchmark::State& st) {
    const auto g = grid_away_from_critical();
    std::size_t k = 0;
    for (auto _ : st) {
        const PT& s = g[k++ % g.size()];
        benchmark::DoNotOptimize(region3_pT(s.p, s.T));
    }
}
BENCHMARK(BM_region3_pT);

void BM_region3_pT_near_critical(benchmark::State& st) {
    const auto g = grid_near_critical();
    std::size_t k = 0;
    for (auto _ : st) {
        const PT& s = g[k++ % g.size()];
        benchmark::DoNotOptimize(region3_pT(s.p, s.T));
    }
}
BENCHMARK(BM_region3_pT_near_critical);

void BM_region3_forward_reference(benchmark::State& st) {
    // One evaluation of Eq. 28 with all properties, for scale.
    double rho = 300.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(region3(rho, 660.0));
        rho = rho < 700.0 ? rho + 1.0 : 300.0;
    }
}
BENCHMARK(BM_region3_forward_reference);

void BM_region3_saturation(benchmark::State& st) {
    double T = 623.15;
    for (auto _ : st) {
        benchmark::DoNotOptimize(region3_saturation(T));
        T = T < 646.0 ? T + 0.37 : 623.15;
    }
}
BENCHMARK(BM_region3_saturation);

void BM_region3_saturation_within_1mK_of_Tc(benchmark::State& st) {
    double dT = 1e-3;
    for (auto _ : st) {
        benchmark::DoNotOptimize(region3_saturation(Tc - dT));
        dT = dT > 1e-9 ? dT * 0.5 : 1e-3;
    }
}
BENCHMARK(BM_region3_saturation_within_1mK_of_Tc);

}  // namespace
