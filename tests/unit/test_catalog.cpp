// Checks over the whole catalogue: every function added later is covered
// without new test code.
#include "support.hpp"

#include <algorithm>
#include <cmath>
#include <set>

using namespace solarith::catalog;

TEST_CASE("catalogue entries are complete and consistent")
{
    std::set<std::string> names, programmatic;
    for (const auto& f : functions()) {
        CAPTURE(f.name);
        CHECK(names.insert(std::string(f.name)).second);
        CHECK(programmatic.insert(programmatic_name(f.name)).second);
        CHECK(!f.family.empty());
        CHECK(f.summary.size() > 20);
        CHECK(!f.result_unit.empty());
        CHECK(f.method.size() > 40);
        CHECK(static_cast<bool>(f.invoke));
        bool optional_seen = false;
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const auto& a = f.args[i];
            CAPTURE(a.name);
            CHECK(!a.name.empty());
            CHECK(!a.description.empty());
            const bool textual = a.kind == ArgKind::Text || a.kind == ArgKind::OptionalText || a.kind == ArgKind::Rest;
            CHECK_MESSAGE((textual || !a.unit.empty()), "numeric arguments state a unit ('–' when dimensionless)");
            const bool optional = a.kind == ArgKind::OptionalNumber || a.kind == ArgKind::OptionalText
                                  || a.kind == ArgKind::OptionalRange;
            if (optional)
                optional_seen = true;
            else if (a.kind != ArgKind::Rest)
                CHECK_MESSAGE(!optional_seen, "required arguments come before optional ones");
            if (a.kind == ArgKind::Rest)
                CHECK_MESSAGE(i + 1 == f.args.size(), "the variable argument list comes last");
        }
    }
}

TEST_CASE("every function's example call is accepted and gives a finite result")
{
    for (const auto& f : functions()) {
        CAPTURE(f.name);
        CAPTURE(f.example);
        if (f.example.empty()) {  // allowed only where a range is too long to write inline
            CHECK(std::any_of(f.args.begin(), f.args.end(), [](const ArgSpec& a) { return a.kind == ArgKind::Range; }));
            continue;
        }
        const auto result = evaluate(f, parse_arguments(f.example));
        if (f.result == ResultKind::Number)
            CHECK(std::isfinite(std::get<double>(result)));
        else if (f.result == ResultKind::Text)
            CHECK(!std::get<std::string>(result).empty());
        else
            CHECK(!std::get<Table>(result).empty());
    }
}

TEST_CASE("NaN and infinity in any numeric argument are refused, naming the function")
{
    for (const auto& f : functions()) {
        const auto example = parse_arguments(f.example);
        for (std::size_t i = 0; i < example.size() && i < f.args.size(); ++i) {
            if (example[i].kind != Value::Kind::Number || f.args[i].kind == ArgKind::Rest)
                continue;
            for (double bad : {std::nan(""), HUGE_VAL, -HUGE_VAL}) {
                auto values = example;
                values[i] = Value::of(bad);
                CAPTURE(f.name);
                CAPTURE(f.args[i].name);
                CAPTURE(bad);
                const std::string message = diagnose(f, values);
                CHECK(message != "ok");
                CHECK(message.rfind(std::string(f.name) + ":", 0) == 0);
            }
        }
    }
}

TEST_CASE("text where a number belongs and blank range cells are refused")
{
    for (const auto& f : functions()) {
        const auto example = parse_arguments(f.example);
        for (std::size_t i = 0; i < example.size() && i < f.args.size(); ++i) {
            CAPTURE(f.name);
            CAPTURE(f.args[i].name);
            if (f.args[i].kind == ArgKind::Number || f.args[i].kind == ArgKind::OptionalNumber) {
                auto values = example;
                values[i] = Value::of(std::string("abc"));
                CHECK(diagnose(f, values).find(std::string(f.args[i].name) + " is the text \"abc\"") != std::string::npos);
            }
            if (f.args[i].kind == ArgKind::Range) {
                auto values = example;
                REQUIRE(values[i].kind == Value::Kind::Table);
                values[i].table.front().front() = Value::of(std::string());
                CHECK(diagnose(f, values).find("blank") != std::string::npos);
            }
        }
    }
}

TEST_CASE("programmatic names follow the fixed rule")
{
    CHECK(programmatic_name("RAD_VF_COAXIAL_DISKS") == "radVfCoaxialDisks");
    CHECK(programmatic_name("FN_METHOD") == "fnMethod");
    CHECK(programmatic_name("STORE_PCM") == "storePcm");
}

TEST_CASE("argument lists parse as in a Calc formula")
{
    const auto v = parse_arguments(" 1.5; ; \"a \"\"b\"\"\"; {1; 2 | 3; 4}");
    REQUIRE(v.size() == 4);
    CHECK(v[0].number == 1.5);
    CHECK(v[1].kind == Value::Kind::Omitted);
    CHECK(v[2].text == "a \"b\"");
    REQUIRE(v[3].table.size() == 2);
    CHECK(v[3].table[1][0].number == 3);
    CHECK_THROWS_AS(parse_arguments("{1; 2"), std::invalid_argument);
    CHECK_THROWS_AS(parse_arguments("1; x"), std::invalid_argument);
    CHECK(parse_arguments("4.9e-324")[0].number > 0);  // the smallest subnormal is a number, not an error
}

TEST_CASE("FN_METHOD and FN_DIAGNOSE read the catalogue")
{
    CHECK(test::call_text("FN_METHOD", "\"rad_emissive\"").find("Stefan") != std::string::npos);
    CHECK(test::call_text("FN_DIAGNOSE", "\"RAD_EMISSIVE\"; 60; 0.9") == "ok");
    CHECK(test::call_text("FN_DIAGNOSE", "\"RAD_EMISSIVE\"; 60; 1.2")
          == "RAD_EMISSIVE: emissivity = 1.2 is outside 0..1");
    CHECK(test::call_text("FN_DIAGNOSE", "\"RAD_EMISSIVE\"; 60; 0.5; 7").find("at most 2 arguments") != std::string::npos);
    CHECK(test::call_text("FN_DIAGNOSE", "\"RAD_EMISSIVE\"").find("T is missing") != std::string::npos);
    CHECK(test::call_text("FN_DIAGNOSE", "\"NO_SUCH\"").find("not a Solarith function") != std::string::npos);
    CHECK_THROWS_AS(test::call_text("FN_METHOD", "\"NO_SUCH\""), solarith::DomainError);
}
