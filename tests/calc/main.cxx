// SPDX-License-Identifier: MPL-2.0
// calc_tests: GoogleTest cases that run in a headless LibreOffice Calc with
// the freshly built extension. One office serves the whole run (office/office.hxx).
#include <gtest/gtest.h>

#include "calc_test.hxx"

namespace {

class OfficeEnvironment : public ::testing::Environment {
public:
    void TearDown() override { isentra::calctest::Office::shutdown(); }
};

}  // namespace

int main(int argc, char** argv) {
    ::testing::InitGoogleTest(&argc, argv);
    ::testing::AddGlobalTestEnvironment(new OfficeEnvironment);  // gtest takes ownership
    return RUN_ALL_TESTS();
}
