// SPDX-License-Identifier: MPL-2.0
// IAPWS-IF97 region 2, basic equation R7-97(2012) Eq. (15) (ideal part
// Eq. (16), Table 10; residual part Eq. (17), Table 11) and the
// supplementary equation for the metastable-vapour region Eq. (18)
// (residual part Eq. (19), Table 16; ideal part Eq. (16) with the n1, n2 of
// Table 10 footnote a). Property relations: Table 12; derivatives Tables 13,
// 14, 17.
#include <cmath>

#include "forward_detail.hpp"
#include "isentra/if97/if97.hpp"

namespace isentra::if97 {
namespace {

constexpr double Tstar = 540.0;  // K   (Eqs. 16, 17, 19)
// p* = 1 MPa, so pi = p.

// R7-97(2012) Table 10: ideal-gas part, exponents J^o_i and n^o_i.
constexpr int kNo = 9;
constexpr int Jo[kNo] = {0, 1, -5, -4, -3, -2, -1, 2, 3};
constexpr double no_stable[kNo] = {
    -0.96927686500217e1, 0.10086655968018e2, -0.56087911283020e-2,
    0.71452738081455e-1, -0.40710498223928,  0.14240819171444e1,
    -0.43839511319450e1, -0.28408632460772,  0.21268463753307e-1};
// Table 10 footnote a: n^o_1, n^o_2 when Eq. (16) is part of Eq. (18).
constexpr double no_meta[kNo] = {
    -0.96937268393049e1, 0.10087275970006e2, -0.56087911283020e-2,
    0.71452738081455e-1, -0.40710498223928,  0.14240819171444e1,
    -0.43839511319450e1, -0.28408632460772,  0.21268463753307e-1};

// R7-97(2012) Table 11: residual part of Eq. (17).
constexpr int kNr = 43;
constexpr int Ir[kNr] = {1,  1,  1,  1,  1,  2,  2,  2,  2,  2,  3,  3,  3,  3,  3,
                         4,  4,  4,  5,  6,  6,  6,  7,  7,  7,  8,  8,  9,  10, 10,
                         10, 16, 16, 18, 20, 20, 20, 21, 22, 23, 24, 24, 24};
constexpr int Jr[kNr] = {0,  1,  2,  3,  6,  1,  2,  4,  7,  36, 0,  1,  3,  6,  35,
                         1,  2,  3,  7,  3,  16, 35, 0,  11, 25, 8,  36, 13, 4,  10,
                         14, 29, 50, 57, 20, 35, 48, 21, 53, 39, 26, 40, 58};
constexpr double nr[kNr] = {
    -0.17731742473213e-2,  -0.17834862292358e-1,  -0.45996013696365e-1,  -0.57581259083432e-1,
    -0.50325278727930e-1,  -0.33032641670203e-4,  -0.18948987516315e-3,  -0.39392777243355e-2,
    -0.43797295650573e-1,  -0.26674547914087e-4,  0.20481737692309e-7,   0.43870667284435e-6,
    -0.32277677238570e-4,  -0.15033924542148e-2,  -0.40668253562649e-1,  -0.78847309559367e-9,
    0.12790717852285e-7,   0.48225372718507e-6,   0.22922076337661e-5,   -0.16714766451061e-10,
    -0.21171472321355e-2,  -0.23895741934104e2,   -0.59059564324270e-17, -0.12621808899101e-5,
    -0.38946842435739e-1,  0.11256211360459e-10,  -0.82311340897998e1,   0.19809712802088e-7,
    0.10406965210174e-18,  -0.10234747095929e-12, -0.10018179379511e-8,  -0.80882908646985e-10,
    0.10693031879409,      -0.33662250574171,     0.89185845355421e-24,  0.30629316876232e-12,
    -0.42002467698208e-5,  -0.59056029685639e-25, 0.37826947613457e-5,   -0.12768608934681e-14,
    0.73087610595061e-28,  0.55414715350778e-16,  -0.94369707241210e-6};

// R7-97(2012) Table 16: residual part of Eq. (19), metastable vapour.
constexpr int kNm = 13;
constexpr int Im[kNm] = {1, 1, 1, 1, 2, 2, 2, 3, 3, 4, 4, 5, 5};
constexpr int Jm[kNm] = {0, 2, 5, 11, 1, 7, 16, 4, 16, 7, 10, 9, 10};
constexpr double nm[kNm] = {
    -0.73362260186506e-2, -0.88223831943146e-1, -0.72334555213245e-1, -0.40813178534455e-2,
    0.20097803380207e-2,  -0.53045921898642e-1, -0.76190409086970e-2, -0.63498037657313e-2,
    -0.86043093028588e-1, 0.75321581522770e-2,  -0.79238375446139e-2, -0.22888160778447e-3,
    -0.26456501482810e-2};

// Ideal-gas part, Eq. (16) and Table 13 (pi-derivatives are analytic).
inline void ideal_part(double pi, double tau, const double* no, detail::GibbsSplit& g) {
    const double it = 1.0 / tau;
    const double it2 = it * it;
    const double it3 = it2 * it;
    const double tp[kNo] = {1.0, tau, it3 * it2, it2 * it2, it3, it2, it, tau * tau,
                            tau * tau * tau};
    detail::ideal_gas_part(pi, tau, no, Jo, tp, kNo, g);
}

// Residual parts sum_i n_i pi^I (tau - 0.5)^J, Eqs. (17) and (19), grouped by
// I. Powers of (tau - 0.5) are tabulated with J-1 and J-2 (no division by
// tau - 0.5, which vanishes at T = 1080 K); pi-derivatives divide by pi once.
constexpr auto kTermsStable =
    detail::make_grouped<kNr, detail::count_groups(Ir)>(Ir, Jr, nr, 0, true);
constexpr auto kTermsMeta =
    detail::make_grouped<kNm, detail::count_groups(Im)>(Im, Jm, nm, 0, true);

// Derivatives of Tables 14 and 17.
template <int IMAX, int JMAX, class Terms>
inline void residual_part(double pi, double tau, const Terms& terms, detail::GibbsSplit& g) {
    double pp[IMAX + 1];
    double bp[JMAX + 1];
    detail::powers<IMAX + 1>(pi, pp);
    detail::powers<JMAX + 1>(tau - 0.5, bp);
    const detail::Sums S = detail::eval_grouped(terms, pp, bp);
    const double ipi = 1.0 / pi;
    g.gr = S.s;
    g.gr_p = S.sI * ipi;
    g.gr_pp = S.sII * ipi * ipi;
    g.gr_t = S.sJ;
    g.gr_tt = S.sJJ;
    g.gr_pt = S.sIJ * ipi;
}

static_assert(detail::sorted_by_I(Ir), "terms must be sorted by I");
static_assert(detail::sorted_by_I(Im), "terms must be sorted by I");

}  // namespace

Props region2(double p, double T) {
    const double pi = p;  // p* = 1 MPa
    const double tau = Tstar / T;
    detail::GibbsSplit g;
    ideal_part(pi, tau, no_stable, g);
    residual_part<24, 58>(pi, tau, kTermsStable, g);
    return detail::props_from_gibbs_split(p, T, pi, tau, g, 2);
}

Props region2_metastable(double p, double T) {
    const double pi = p;  // p* = 1 MPa
    const double tau = Tstar / T;
    detail::GibbsSplit g;
    ideal_part(pi, tau, no_meta, g);
    residual_part<5, 16>(pi, tau, kTermsMeta, g);
    return detail::props_from_gibbs_split(p, T, pi, tau, g, 2);
}

}  // namespace isentra::if97
