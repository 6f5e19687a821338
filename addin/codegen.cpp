// Writes what follows mechanically from the function catalogue:
//   solarith-codegen idl   -> the UNO interface (checked in as idl/XSolarith.idl)
//   solarith-codegen glue  -> the add-in's method bodies (included by addin.cpp)
//   solarith-codegen docs  -> the function reference (checked in as docs/functions.md)
//   solarith-codegen names|examples -> lists the tests compare with Calc and the type library
//   solarith-codegen evaluate NAME  -> the core's result for arguments read from stdin
// The build compiles the checked-in IDL and regenerates the glue; the tests
// fail when the checked-in files and the catalogue disagree.
#include "solarith/catalog.hpp"
#include "solarith/errors.hpp"

#include <iostream>
#include <iterator>
#include <set>
#include <string>

using namespace solarith::catalog;

namespace {

// Words UNO IDL reserves; an argument so named gets the suffix "Arg".
bool is_idl_keyword(std::string_view word)
{
    static const std::set<std::string_view> keywords = {
        "any", "attribute", "boolean", "byte", "char", "const", "constants", "double", "enum",
        "exception", "float", "get", "hyper", "in", "inout", "interface", "long", "module",
        "oneway", "out", "property", "published", "raises", "readonly", "sequence", "service",
        "set", "short", "singleton", "string", "struct", "type", "typedef", "unsigned", "void"};
    return keywords.count(word) > 0;
}

// UNO IDL identifiers take no underscores: "T_inner" becomes "tInner".
std::string idl_parameter_name(std::string_view name)
{
    std::string out = programmatic_name(name);
    if (is_idl_keyword(out))
        out += "Arg";
    return out;
}

const char* idl_type(ArgKind kind)
{
    switch (kind) {
    case ArgKind::Number: return "double";
    case ArgKind::Text: return "string";
    case ArgKind::OptionalNumber:
    case ArgKind::OptionalText:
    case ArgKind::OptionalRange: return "any";
    case ArgKind::Range: return "sequence< sequence< any > >";
    case ArgKind::Rest: return "sequence< any >";
    }
    return "?";
}

const char* cpp_type(ArgKind kind)
{
    switch (kind) {
    case ArgKind::Number: return "double";
    case ArgKind::Text: return "const ::rtl::OUString&";
    case ArgKind::OptionalNumber:
    case ArgKind::OptionalText:
    case ArgKind::OptionalRange: return "const css::uno::Any&";
    case ArgKind::Range: return "const css::uno::Sequence< css::uno::Sequence< css::uno::Any > >&";
    case ArgKind::Rest: return "const css::uno::Sequence< css::uno::Any >&";
    }
    return "?";
}

const char* converter(ArgKind kind)
{
    switch (kind) {
    case ArgKind::Number: return "from_double";
    case ArgKind::Text: return "from_text";
    case ArgKind::OptionalNumber:
    case ArgKind::OptionalText:
    case ArgKind::OptionalRange: return "from_any";
    case ArgKind::Range: return "from_range";
    case ArgKind::Rest: return "";
    }
    return "?";
}

const char* idl_result_type(ResultKind kind)
{
    switch (kind) {
    case ResultKind::Number: return "double";
    case ResultKind::Text: return "string";
    case ResultKind::Table: return "sequence< sequence< any > >";
    }
    return "?";
}

const char* cpp_result_type(ResultKind kind)
{
    switch (kind) {
    case ResultKind::Number: return "double";
    case ResultKind::Text: return "::rtl::OUString";
    case ResultKind::Table: return "css::uno::Sequence< css::uno::Sequence< css::uno::Any > >";
    }
    return "?";
}

const char* result_call(ResultKind kind)
{
    switch (kind) {
    case ResultKind::Number: return "number_result";
    case ResultKind::Text: return "text_result";
    case ResultKind::Table: return "table_result";
    }
    return "?";
}

void write_idl(std::ostream& out)
{
    out << "// Generated from the Solarith function catalogue by solarith-codegen; do not edit.\n"
           "// Regenerate with: cmake --build build --target regenerate\n"
           "// The method names are stored in saved documents: never rename one.\n\n"
           "module org { module solarith {\n\n"
           "interface XSolarith : com::sun::star::uno::XInterface\n{\n";
    for (const auto& f : functions()) {
        out << "    // " << f.name << "\n    " << idl_result_type(f.result) << ' ' << programmatic_name(f.name) << '(';
        for (std::size_t i = 0; i < f.args.size(); ++i)
            out << (i ? ", " : "") << "[in] " << idl_type(f.args[i].kind) << ' ' << idl_parameter_name(f.args[i].name);
        out << ")\n        raises (com::sun::star::lang::IllegalArgumentException,"
               " com::sun::star::sheet::NoConvergenceException);\n";
    }
    out << "};\n\n}; };\n";
}

void write_glue(std::ostream& out)
{
    out << "// Generated from the Solarith function catalogue by solarith-codegen; do not edit.\n"
           "// An error \"marked 'override', but does not override\" below means idl/XSolarith.idl is\n"
           "// older than the catalogue: run cmake --build build --target regenerate\n";
    const auto& all = functions();
    for (std::size_t index = 0; index < all.size(); ++index) {
        const auto& f = all[index];
        out << cpp_result_type(f.result) << " SAL_CALL " << programmatic_name(f.name) << '(';
        for (std::size_t i = 0; i < f.args.size(); ++i)
            out << (i ? ", " : "") << cpp_type(f.args[i].kind) << " a" << i;
        out << ") override\n{\n    return " << result_call(f.result) << '(' << index
            << ", [&] { return ";
        const bool has_rest = !f.args.empty() && f.args.back().kind == ArgKind::Rest;
        out << (has_rest ? "with_rest(Values{" : "Values{");
        for (std::size_t i = 0; i < f.args.size(); ++i)
            if (f.args[i].kind != ArgKind::Rest)
                out << (i ? ", " : "") << converter(f.args[i].kind) << "(a" << i << ')';
        out << '}';
        if (has_rest)
            out << ", a" << f.args.size() - 1 << ')';
        out << "; });\n}\n";
    }
}

std::string markdown_escape(std::string_view text)
{
    std::string out;
    for (char c : text) {
        if (c == '|')
            out += '\\';
        out += c;
    }
    return out;
}

std::string anchor(std::string_view name)
{
    std::string out;
    for (char c : name)
        out += static_cast<char>(c == '_' ? '_' : std::tolower(static_cast<unsigned char>(c)));
    return out;
}

std::string example_result(const FunctionSpec& f)
{
    const Result result = evaluate(f, parse_arguments(f.example));
    if (const double* number = std::get_if<double>(&result))
        return solarith::format_number(*number) + (f.result_unit == "–" ? "" : " " + std::string(f.result_unit));
    if (const Table* table = std::get_if<Table>(&result))
        return "an array of " + std::to_string(table->size()) + " rows";
    return "\"" + std::get<std::string>(result) + "\"";
}

void write_docs(std::ostream& out)
{
    out << "# Solarith function reference\n\n"
           "Generated from the function catalogue (`core/catalog/`) by `solarith-codegen docs`; do not edit.\n"
           "Regenerate with `cmake --build build --target regenerate`. The same texts appear in Calc's\n"
           "function wizard and through `FN_METHOD`.\n\n"
           "Conventions: temperatures in °C (differences in K), SI units otherwise; optional arguments in\n"
           "square brackets. Bad input gives Err:502, a solver that fails gives Err:523;\n"
           "`FN_DIAGNOSE(\"NAME\"; arguments…)` says why.\n";
    std::string family;
    for (const auto& f : functions()) {
        if (f.family != family) {
            family = f.family;
            out << "\n## " << family << "\n\n| function | result |\n|---|---|\n";
            for (const auto& g : functions())
                if (g.family == family)
                    out << "| [" << g.name << "](#" << anchor(g.name) << ") | " << markdown_escape(g.result_unit)
                        << " |\n";
        }
        out << "\n### " << f.name << "\n\n`" << f.name << '(';
        const std::size_t required = required_count(f);
        for (std::size_t i = 0; i < f.args.size(); ++i) {
            const bool optional = i >= required && f.args[i].kind != ArgKind::Rest;
            out << (i ? "; " : "") << (optional ? "[" : "") << f.args[i].name
                << (f.args[i].kind == ArgKind::Rest ? "…" : "") << (optional ? "]" : "");
        }
        out << ")` → " << f.result_unit << "\n\n" << function_help(f) << "\n\n";
        if (!f.args.empty()) {
            out << "| argument | unit | description |\n|---|---|---|\n";
            for (const auto& a : f.args)
                out << "| " << a.name << " | " << markdown_escape(a.unit.empty() ? "text" : a.unit) << " | "
                    << markdown_escape(argument_help(a)) << " |\n";
            out << '\n';
        }
        out << "Method: " << f.method << "\n\n";
        if (f.example.empty())
            out << "Example: its ranges are too long to write inline; see the example workbooks.\n";
        else
            out << "Example: `=" << f.name << '(' << f.example << ")` → " << example_result(f) << "\n";
    }
}

// One line per function: display name, programmatic name, argument count,
// the wizard's function description, then each argument's name, unit and description.
void write_names(std::ostream& out)
{
    for (const auto& f : functions()) {
        out << f.name << '\t' << programmatic_name(f.name) << '\t' << f.args.size() << '\t' << function_help(f);
        for (const auto& a : f.args)
            out << '\t' << a.name << '\t' << a.unit << '\t' << argument_help(a);
        out << '\n';
    }
}

// One line per function with a one-cell result and an inline example: display
// name, example arguments, the core's result (17 significant digits) -- what
// the same call must give in Calc.
void write_examples(std::ostream& out)
{
    out.precision(17);
    for (const auto& f : functions()) {
        if (f.example.empty() || f.result == ResultKind::Table)
            continue;  // array formulas with long ranges have tests of their own
        const Result result = evaluate(f, parse_arguments(f.example));
        out << f.name << '\t' << f.example << '\t';
        if (const double* number = std::get_if<double>(&result))
            out << *number;
        else
            out << std::get<std::string>(result);
        out << '\n';
    }
}

// One line per function: display name, then one letter per argument kind
// (N number, n optional number, T text, t optional text, R range, * rest,
// r optional range).
void write_kinds(std::ostream& out)
{
    for (const auto& f : functions()) {
        out << f.name << '\t';
        for (const auto& a : f.args)
            out << "NnTtR*r"[static_cast<int>(a.kind)];
        out << '\n';
    }
}

// Evaluates NAME with the Calc-style argument list read from standard input
// (inline arrays {..|..} for ranges) and prints the result, a table as one
// line per row with tab-separated cells, numbers with 17 significant digits:
// what the tests through Calc compare array formulas with.
int write_evaluation(std::ostream& out, const std::string& name)
{
    const FunctionSpec* f = find(name);
    if (!f) {
        std::cerr << "no function " << name << '\n';
        return 2;
    }
    const std::string arguments{std::istreambuf_iterator<char>(std::cin), std::istreambuf_iterator<char>()};
    const Result result = evaluate(*f, parse_arguments(arguments));
    out.precision(17);
    auto write_cell = [&out](const Value& cell) {
        if (cell.kind == Value::Kind::Number)
            out << cell.number;
        else
            out << cell.text;
    };
    if (const double* number = std::get_if<double>(&result))
        out << *number << '\n';
    else if (const std::string* text = std::get_if<std::string>(&result))
        out << *text << '\n';
    else
        for (const auto& row : std::get<Table>(result)) {
            for (std::size_t c = 0; c < row.size(); ++c) {
                out << (c ? "\t" : "");
                write_cell(row[c]);
            }
            out << '\n';
        }
    return 0;
}

}  // namespace

int main(int argc, char** argv)
{
    const std::string what = argc > 1 ? argv[1] : "";
    if (what == "idl")
        write_idl(std::cout);
    else if (what == "glue")
        write_glue(std::cout);
    else if (what == "docs")
        write_docs(std::cout);
    else if (what == "names")
        write_names(std::cout);
    else if (what == "examples")
        write_examples(std::cout);
    else if (what == "kinds")
        write_kinds(std::cout);
    else if (what == "evaluate" && argc > 2) {
        try {
            const int status = write_evaluation(std::cout, argv[2]);
            if (status)
                return status;
        } catch (const std::exception& e) {
            std::cerr << e.what() << '\n';
            return 1;
        }
    } else {
        std::cerr << "usage: solarith-codegen idl|glue|docs|names|examples|kinds|evaluate NAME < arguments\n";
        return 2;
    }
    return std::cout.good() ? 0 : 1;
}
