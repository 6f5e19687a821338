// The machinery of the function catalogue: reading arguments, evaluating a
// call under the error contract, and the help texts. The per-family tables
// live beside this file, one per family.
#include "solarith/catalog.hpp"

#include "solarith/errors.hpp"

#include <cctype>
#include <cstdlib>
#include <cmath>
#include <new>
#include <stdexcept>

namespace solarith::catalog {

Value Value::of(double number)
{
    Value v;
    v.kind = Kind::Number;
    v.number = number;
    return v;
}

Value Value::of(std::string text)
{
    Value v;
    v.kind = Kind::Text;
    v.text = std::move(text);
    return v;
}

Value Value::of_table(std::vector<std::vector<Value>> rows)
{
    Value v;
    v.kind = Kind::Table;
    v.table = std::move(rows);
    return v;
}

namespace {

bool is_required(ArgKind kind)
{
    return kind == ArgKind::Number || kind == ArgKind::Text || kind == ArgKind::Range;
}

std::string quoted(const std::string& text)
{
    constexpr std::size_t longest = 40;
    if (text.size() <= longest)
        return "\"" + text + "\"";
    return "\"" + text.substr(0, longest) + "...\"";
}

std::string describe_cell(const Value& cell)
{
    switch (cell.kind) {
    case Value::Kind::Omitted: return "blank";
    case Value::Kind::Number: return format_number(cell.number);
    case Value::Kind::Text: return cell.text.empty() ? "blank" : "the text " + quoted(cell.text);
    case Value::Kind::Table: return "a range";
    }
    return "unknown";
}

bool is_single_cell(const Value& v)
{
    return v.kind == Value::Kind::Table && v.table.size() == 1 && v.table.front().size() == 1;
}

std::string range_shape(const Value& v)
{
    const std::size_t rows = v.table.size();
    const std::size_t columns = rows ? v.table.front().size() : 0;
    return std::to_string(rows) + "x" + std::to_string(columns);
}

}  // namespace

std::size_t required_count(const FunctionSpec& spec)
{
    std::size_t count = 0;
    for (std::size_t i = 0; i < spec.args.size(); ++i)
        if (is_required(spec.args[i].kind))
            count = i + 1;
    return count;
}

Args::Args(const FunctionSpec& spec, const std::vector<Value>& values)
    : spec_(spec), values_(values)
{
    const bool has_rest = !spec.args.empty() && spec.args.back().kind == ArgKind::Rest;
    const std::size_t fixed = has_rest ? spec.args.size() - 1 : spec.args.size();
    fixed_ = fixed;
    if (values.size() > fixed && !has_rest)
        fail_domain(std::string(spec.name).c_str(), "takes at most " + std::to_string(fixed) + " arguments, "
                                                        + std::to_string(values.size()) + " given");
    for (std::size_t i = 0; i < std::min(fixed, spec.args.size()); ++i)
        if (is_required(spec.args[i].kind) && at(i).kind == Value::Kind::Omitted)
            fail(i, "is missing; it is required");
}

std::vector<Value> Args::rest() const
{
    if (values_.size() <= fixed_)
        return {};
    return {values_.begin() + static_cast<std::ptrdiff_t>(fixed_), values_.end()};
}

const Value& Args::at(std::size_t index) const
{
    static const Value nothing;
    return index < values_.size() ? values_[index] : nothing;
}

bool Args::omitted(std::size_t index) const
{
    return at(index).kind == Value::Kind::Omitted;
}

void Args::fail(std::size_t index, const std::string& reason) const
{
    const std::string argument =
        index < spec_.args.size() ? std::string(spec_.args[index].name) : "argument " + std::to_string(index + 1);
    fail_domain(std::string(spec_.name).c_str(), argument + " " + reason);
}

double Args::number(std::size_t index) const
{
    const Value& v = at(index);
    switch (v.kind) {
    case Value::Kind::Number: return v.number;
    case Value::Kind::Omitted:
        if (index < spec_.args.size() && spec_.args[index].kind == ArgKind::OptionalNumber
            && !std::isnan(spec_.args[index].default_number))
            return spec_.args[index].default_number;
        fail(index, "is missing; a number is expected");
    case Value::Kind::Text: fail(index, "is " + describe_cell(v) + "; a number is expected");
    case Value::Kind::Table:
        if (is_single_cell(v)) {
            const Value& cell = v.table.front().front();
            if (cell.kind == Value::Kind::Number)
                return cell.number;
            fail(index, "is " + describe_cell(cell) + "; a number is expected");
        }
        fail(index, "is a range of " + range_shape(v) + " cells; a single number is expected");
    }
    fail(index, "has an unknown kind");
}

std::optional<double> Args::optional_number(std::size_t index) const
{
    if (omitted(index)) {
        const double fallback = index < spec_.args.size() ? spec_.args[index].default_number : NAN;
        if (std::isnan(fallback))
            return std::nullopt;
        return fallback;
    }
    return number(index);
}

std::string Args::text(std::size_t index) const
{
    const Value& v = at(index);
    switch (v.kind) {
    case Value::Kind::Text: return v.text;
    case Value::Kind::Omitted:
        if (index < spec_.args.size() && spec_.args[index].kind == ArgKind::OptionalText)
            return std::string(spec_.args[index].default_text);
        fail(index, "is missing; a text is expected");
    case Value::Kind::Number: fail(index, "is the number " + format_number(v.number) + "; a text is expected");
    case Value::Kind::Table:
        if (is_single_cell(v) && v.table.front().front().kind == Value::Kind::Text)
            return v.table.front().front().text;
        fail(index, "is a range; a single text is expected");
    }
    fail(index, "has an unknown kind");
}

std::vector<double> Args::numbers(std::size_t index) const
{
    const Value& v = at(index);
    if (v.kind == Value::Kind::Number)
        return {v.number};
    if (v.kind != Value::Kind::Table)
        fail(index, "is " + describe_cell(v) + "; a range of numbers is expected");
    std::vector<double> result;
    for (std::size_t r = 0; r < v.table.size(); ++r)
        for (std::size_t c = 0; c < v.table[r].size(); ++c)
            result.push_back(cell_number(index, v.table[r][c], r, c));
    return result;
}

double Args::cell_number(std::size_t index, const Value& cell, std::size_t row, std::size_t column) const
{
    if (cell.kind != Value::Kind::Number)
        fail(index, "has a cell that is " + describe_cell(cell) + " (row " + std::to_string(row + 1) + ", column "
                        + std::to_string(column + 1) + " of the range); every cell must hold a number");
    return cell.number;
}

Args::Matrix Args::matrix(std::size_t index) const
{
    const Value& v = at(index);
    if (v.kind == Value::Kind::Number)
        return {1, 1, {v.number}};
    if (v.kind != Value::Kind::Table)
        fail(index, "is " + describe_cell(v) + "; a range of numbers is expected");
    Matrix m;
    m.rows = v.table.size();
    m.columns = m.rows ? v.table.front().size() : 0;
    m.cells.reserve(m.rows * m.columns);
    for (std::size_t r = 0; r < m.rows; ++r) {
        if (v.table[r].size() != m.columns)
            fail(index, "has rows of different length (row " + std::to_string(r + 1)
                            + "); a rectangular range is expected");
        for (std::size_t c = 0; c < m.columns; ++c)
            m.cells.push_back(cell_number(index, v.table[r][c], r, c));
    }
    return m;
}

Result evaluate(const FunctionSpec& spec, const std::vector<Value>& values)
{
    const std::string name(spec.name);
    Result result;
    try {
        result = spec.invoke(Args(spec, values));
    } catch (const DomainError&) {
        throw;
    } catch (const EvaluationError&) {
        throw;
    } catch (const std::domain_error& e) {  // Boost.Math's default policy for a bad argument
        fail_domain(name.c_str(), std::string("an input is outside the method's domain (") + e.what() + ")");
    } catch (const std::overflow_error&) {  // Boost.Math: result too large
        fail_domain(name.c_str(), "the result is too large to represent; check the input magnitudes");
    } catch (const std::bad_alloc&) {
        fail_evaluation(name.c_str(), "out of memory");
    } catch (const std::exception& e) {
        fail_evaluation(name.c_str(), std::string("calculation failed (") + e.what() + ")");
    } catch (...) {
        fail_evaluation(name.c_str(), "calculation failed");
    }
    auto refuse_non_finite = [&](double number) {
        if (!std::isfinite(number))
            fail_domain(name.c_str(), "the result is not a finite number (" + format_number(number)
                                          + "); the inputs lie outside what the method can represent");
    };
    if (const double* number = std::get_if<double>(&result))
        refuse_non_finite(*number);
    if (const Table* table = std::get_if<Table>(&result))
        for (const auto& row : *table)
            for (const auto& cell : row)
                if (cell.kind == Value::Kind::Number)
                    refuse_non_finite(cell.number);
    return result;
}

std::string diagnose(const FunctionSpec& spec, const std::vector<Value>& values)
{
    try {
        evaluate(spec, values);
        return "ok";
    } catch (const std::exception& e) {
        return e.what();
    }
}

std::string method_text(const FunctionSpec& spec)
{
    return std::string(spec.name) + ": " + std::string(spec.method);
}

std::string argument_help(const ArgSpec& arg)
{
    std::string help(arg.description);
    if (!arg.unit.empty())
        help += " [" + std::string(arg.unit) + "]";
    help += ".";
    switch (arg.kind) {
    case ArgKind::OptionalNumber:
        if (std::isnan(arg.default_number))
            help += " Optional.";
        else
            help += " Optional, default " + format_number(arg.default_number) + ".";
        break;
    case ArgKind::OptionalText: help += " Optional, default \"" + std::string(arg.default_text) + "\"."; break;
    case ArgKind::Range: help += " A range of cells; blank or text cells are an error."; break;
    case ArgKind::OptionalRange: help += " Optional. A range of cells; blank or text cells are an error."; break;
    default: break;
    }
    return help;
}

std::string function_help(const FunctionSpec& spec)
{
    std::string help(spec.summary);
    if (spec.result == ResultKind::Number)
        help += " Result in [" + std::string(spec.result_unit) + "].";
    return help;
}

std::string programmatic_name(std::string_view display_name)
{
    std::string out;
    bool start_of_word = true;
    bool first_word = true;
    for (char c : display_name) {
        if (c == '_') {
            start_of_word = true;
            first_word = false;
            continue;
        }
        const auto u = static_cast<unsigned char>(c);
        out += static_cast<char>(start_of_word && !first_word ? std::toupper(u) : std::tolower(u));
        start_of_word = false;
    }
    return out;
}

namespace {

// A tiny reader of Calc argument lists, for examples, tests and fuzz seeds.
class ArgumentParser {
public:
    explicit ArgumentParser(std::string_view text) : text_(text) {}

    std::vector<Value> all()
    {
        std::vector<Value> values;
        skip_space();
        if (pos_ == text_.size())
            return values;
        for (;;) {
            values.push_back(one());
            skip_space();
            if (pos_ == text_.size())
                return values;
            expect(';');
        }
    }

private:
    Value one()
    {
        skip_space();
        if (pos_ == text_.size() || text_[pos_] == ';')
            return Value::omitted();
        if (text_[pos_] == '"')
            return Value::of(quoted_text());
        if (text_[pos_] == '{')
            return inline_array();
        return Value::of(number());
    }

    std::string quoted_text()
    {
        expect('"');
        std::string out;
        while (pos_ < text_.size()) {
            const char c = text_[pos_++];
            if (c != '"') {
                out += c;
                continue;
            }
            if (pos_ < text_.size() && text_[pos_] == '"') {  // "" inside a text is one quote
                out += '"';
                ++pos_;
                continue;
            }
            return out;
        }
        throw std::invalid_argument("unterminated text in argument list");
    }

    Value inline_array()
    {
        expect('{');
        std::vector<std::vector<Value>> rows(1);
        for (;;) {
            skip_space();
            if (pos_ < text_.size() && text_[pos_] == '"')
                rows.back().push_back(Value::of(quoted_text()));
            else
                rows.back().push_back(Value::of(number()));
            skip_space();
            if (pos_ == text_.size())
                throw std::invalid_argument("unterminated inline array");
            const char c = text_[pos_++];
            if (c == '}')
                return Value::of_table(std::move(rows));
            if (c == '|')
                rows.emplace_back();
            else if (c != ';')
                throw std::invalid_argument("unexpected character in inline array");
        }
    }

    double number()
    {
        const std::string rest(text_.substr(pos_));
        char* end = nullptr;
        const double value = std::strtod(rest.c_str(), &end);  // subnormals and overflow are kept, not refused
        if (end == rest.c_str())
            throw std::invalid_argument("expected a number in argument list at \"" + rest + "\"");
        pos_ += static_cast<std::size_t>(end - rest.c_str());
        return value;
    }

    void skip_space()
    {
        while (pos_ < text_.size() && std::isspace(static_cast<unsigned char>(text_[pos_])))
            ++pos_;
    }

    void expect(char c)
    {
        skip_space();
        if (pos_ == text_.size() || text_[pos_] != c)
            throw std::invalid_argument(std::string("expected '") + c + "' in argument list");
        ++pos_;
    }

    std::string_view text_;
    std::size_t pos_ = 0;
};

}  // namespace

std::vector<Value> parse_arguments(std::string_view text)
{
    return ArgumentParser(text).all();
}

const std::vector<FunctionSpec>& functions()
{
    static const std::vector<FunctionSpec> table = [] {
        std::vector<FunctionSpec> all;
        for (auto family : {radiation_functions, conduction_functions, convection_functions,
                            properties_functions, storage_functions, losses_functions, sun_functions,
                            collector_functions, sizing_functions, simulation_functions, audit_functions})
            for (auto& f : family())
                all.push_back(std::move(f));
        return all;
    }();
    return table;
}

const FunctionSpec* find(std::string_view display_name)
{
    auto same = [](std::string_view a, std::string_view b) {
        if (a.size() != b.size())
            return false;
        for (std::size_t i = 0; i < a.size(); ++i)
            if (std::toupper(static_cast<unsigned char>(a[i])) != std::toupper(static_cast<unsigned char>(b[i])))
                return false;
        return true;
    };
    for (const auto& f : functions())
        if (same(f.name, display_name))
            return &f;
    return nullptr;
}

}  // namespace solarith::catalog
