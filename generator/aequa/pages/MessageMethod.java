package aequa.pages;

import java.util.List;

import freemarker.template.TemplateMethodModelEx;
import freemarker.template.TemplateModel;
import freemarker.template.TemplateModelException;
import freemarker.template.TemplateNumberModel;
import freemarker.template.TemplateScalarModel;

import aequa.wording.Wording;

/**
 * The templates' {@code t("key", "name", value, ...)}: a message of the page's language with its named
 * arguments. Strings pass as they are and numbers as numbers (so plural forms choose by them); the result is a
 * plain string, HTML-escaped by Freemarker like any other value.
 */
final class MessageMethod implements TemplateMethodModelEx {

    private final Wording wording;

    MessageMethod(Wording wording) {
        this.wording = wording;
    }

    @Override
    public Object exec(@SuppressWarnings("rawtypes") List arguments) throws TemplateModelException {
        if (arguments.isEmpty() || arguments.size() % 2 != 1) {
            throw new TemplateModelException("t needs a key, then name and value pairs");
        }
        String key = text(arguments.get(0));
        Object[] namesAndValues = new Object[arguments.size() - 1];
        for (int i = 1; i < arguments.size(); i++) {
            Object argument = arguments.get(i);
            namesAndValues[i - 1] = argument instanceof TemplateNumberModel number ? number.getAsNumber() : text(argument);
        }
        try {
            return wording.text(key, namesAndValues);
        } catch (IllegalArgumentException e) {
            throw new TemplateModelException(e.getMessage(), e);
        }
    }

    private static String text(Object argument) throws TemplateModelException {
        if (argument instanceof TemplateScalarModel scalar) {
            return scalar.getAsString();
        }
        if (argument instanceof TemplateModel) {
            throw new TemplateModelException("t takes strings and numbers, not " + argument.getClass().getSimpleName());
        }
        return String.valueOf(argument);
    }
}
