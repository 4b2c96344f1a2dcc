// SPDX-License-Identifier: MPL-2.0
// Timing of the transport properties from (p, T): the state evaluation alone,
// then state + viscosity and state + conductivity (target: each within
// 300 ns beyond the state), and the correlations alone on a solved state.
// Arguments: 1 = liquid (region 1), 2 = vapour (region 2), 3 = near-critical
// region 3 (where mu_2 and lambda_2 are both evaluated).
#include <benchmark/benchmark.h>

#include "isentra/properties/state.hpp"
#include "isentra/properties/transport.hpp"

namespace {

struct PT {
    double p, T;
};
PT point(int which) {
    switch (which) {
    case 1: return {10.0, 400.0};   // region 1
    case 2: return {1.0, 600.0};    // region 2
    default: return {23.0, 650.0};  // region 3, inside the mu_2 region
    }
}

void BM_StatePT(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    double p = pt.p, T = pt.T;
    for (auto _ : b) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(isentra::state_pT(p, T));
    }
}

void BM_StatePT_Viscosity(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    double p = pt.p, T = pt.T;
    for (auto _ : b) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(isentra::viscosity(isentra::state_pT(p, T)));
    }
}

void BM_StatePT_Conductivity(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    double p = pt.p, T = pt.T;
    for (auto _ : b) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(isentra::conductivity(isentra::state_pT(p, T)));
    }
}

void BM_StatePT_AllTransport(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    double p = pt.p, T = pt.T;
    for (auto _ : b) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(isentra::transport(isentra::state_pT(p, T)));
    }
}

void BM_Viscosity_OnState(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    isentra::State st = isentra::state_pT(pt.p, pt.T);
    for (auto _ : b) {
        benchmark::DoNotOptimize(st);
        benchmark::DoNotOptimize(isentra::viscosity(st));
    }
}

void BM_Conductivity_OnState(benchmark::State& b) {
    const PT pt = point(static_cast<int>(b.range(0)));
    isentra::State st = isentra::state_pT(pt.p, pt.T);
    for (auto _ : b) {
        benchmark::DoNotOptimize(st);
        benchmark::DoNotOptimize(isentra::conductivity(st));
    }
}

void BM_SurfaceTension(benchmark::State& b) {
    double T = 400.0;
    for (auto _ : b) {
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(isentra::surface_tension(T));
    }
}

}  // namespace

BENCHMARK(BM_StatePT)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_StatePT_Viscosity)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_StatePT_Conductivity)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_StatePT_AllTransport)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_Viscosity_OnState)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_Conductivity_OnState)->Arg(1)->Arg(2)->Arg(3);
BENCHMARK(BM_SurfaceTension);
