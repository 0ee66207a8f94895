#include "pinproof/errors.hpp"

namespace pinproof {
namespace {
std::string summary(const std::vector<input_problem>& problems)
{
    if (problems.empty()) return "invalid input";
    std::string s = problems.front().where + ": " + problems.front().message;
    if (problems.size() > 1) s += " (and " + std::to_string(problems.size() - 1) + " more)";
    return s;
}
}  // namespace

input_error::input_error(std::vector<input_problem> problems)
    : error(summary(problems)), problems_(std::move(problems))
{
}

input_error::input_error(std::string where, std::string message)
    : input_error(std::vector<input_problem>{{std::move(where), std::move(message)}})
{
}

void problem_list::add(std::string where, std::string message)
{
    problems_.push_back({std::move(where), std::move(message)});
}

void problem_list::add_all(const input_error& e)
{
    for (const auto& p : e.problems()) problems_.push_back(p);
}

void problem_list::throw_if_any() const
{
    if (!problems_.empty()) throw input_error(problems_);
}

}  // namespace pinproof
