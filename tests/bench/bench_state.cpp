// SPDX-License-Identifier: MPL-2.0
// Speed of the state solver as the cell functions use it: h from (p,T) in
// each region, the exact inverses T(p,h), T(p,s), p(h,s), and a wet state
// from (p,x). Run: build/tests/core_bench --benchmark_filter=State
// (figures are recorded in docs/performance.md). The states are demo values.
#include <benchmark/benchmark.h>

#include "isentra/properties/state.hpp"

namespace {

using namespace isentra;

void State_h_pT_region1(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_pT(3.0, 300.0).h);
}
void State_h_pT_region2(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_pT(1.0, 600.0).h);
}
void State_h_pT_region3(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_pT(25.0, 650.0).h);
}
void State_h_pT_region5(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_pT(30.0, 1500.0).h);
}
void State_T_ph_region1(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ph(3.0, 500.0).T);
}
void State_T_ph_region2(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ph(1.0, 3000.0).T);
}
void State_T_ph_region3(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ph(25.0, 1800.0).T);
}
void State_T_ph_region3_below_pc(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ph(20.0, 1700.0).T);
}
void State_T_ph_wet(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ph(0.01, 2000.0).T);
}
void State_T_ps_region1(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ps(3.0, 0.5).T);
}
void State_T_ps_region2(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_ps(1.0, 7.0).T);
}
void State_p_hs_region1(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_hs(500.0, 1.4).p);
}
void State_p_hs_region2(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_hs(3000.0, 7.0).p);
}
void State_p_hs_wet(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_hs(2300.0, 7.0).p);
}
void State_px_wet(benchmark::State& s) {
    for (auto _ : s) benchmark::DoNotOptimize(state_px(0.01, 0.9).h);
}

BENCHMARK(State_h_pT_region1);
BENCHMARK(State_h_pT_region2);
BENCHMARK(State_h_pT_region3);
BENCHMARK(State_h_pT_region5);
BENCHMARK(State_T_ph_region1);
BENCHMARK(State_T_ph_region2);
BENCHMARK(State_T_ph_region3);
BENCHMARK(State_T_ph_region3_below_pc);
BENCHMARK(State_T_ph_wet);
BENCHMARK(State_T_ps_region1);
BENCHMARK(State_T_ps_region2);
BENCHMARK(State_p_hs_region1);
BENCHMARK(State_p_hs_region2);
BENCHMARK(State_p_hs_wet);
BENCHMARK(State_px_wet);

}  // namespace
