package org.depotcast.common;

/** The sign-in form's account or password is wrong; answered 401 without a Basic challenge (a page asked). */
public class SignInRefusedException extends RuntimeException {
    public SignInRefusedException() {
        super("the account or the password is wrong");
    }
}
