// SPDX-License-Identifier: MPL-2.0
// Timing of the IAPWS-IF97 basic (forward) equations.
#include <benchmark/benchmark.h>

#include "isentra/if97/if97.hpp"

namespace if97 = isentra::if97;

static void BM_Region1(benchmark::State& st) {
    double p = 3.0, T = 300.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(if97::region1(p, T));
    }
}
BENCHMARK(BM_Region1);

static void BM_Region2(benchmark::State& st) {
    double p = 0.0035, T = 300.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(if97::region2(p, T));
    }
}
BENCHMARK(BM_Region2);

static void BM_Region3(benchmark::State& st) {
    double rho = 500.0, T = 650.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(rho);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(if97::region3(rho, T));
    }
}
BENCHMARK(BM_Region3);

static void BM_Region5(benchmark::State& st) {
    double p = 30.0, T = 1500.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(if97::region5(p, T));
    }
}
BENCHMARK(BM_Region5);

static void BM_Psat(benchmark::State& st) {
    double T = 500.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(T);
        benchmark::DoNotOptimize(if97::psat(T));
    }
}
BENCHMARK(BM_Psat);

static void BM_Tsat(benchmark::State& st) {
    double p = 1.0;
    for (auto _ : st) {
        benchmark::DoNotOptimize(p);
        benchmark::DoNotOptimize(if97::tsat(p));
    }
}
BENCHMARK(BM_Tsat);
